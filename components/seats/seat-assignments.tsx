"use client";

import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { FormAlert } from "@/components/ui/form-alert";
import { api, ApiError } from "@/lib/client/query";
import type { AssignableMember, SeatRow } from "@/lib/seat-assignments";

function assignSeat(projectId: string, seatId: string, occupantUserId: string | null): Promise<SeatRow> {
  return api<SeatRow>(`/api/projects/${projectId}/seats/${encodeURIComponent(seatId)}`, { method: "PUT", body: { occupantUserId } });
}

/**
 * Who sits where: one row per seat record of the project. Seats keep their ids across layout
 * revisions, so an assignment survives edits of the plan; a seat removed from the layout keeps
 * its row (and history) but takes no new occupant.
 */
export function SeatAssignments({
  projectId,
  initialSeats,
  members,
  canManage,
}: {
  projectId: string;
  initialSeats: SeatRow[];
  members: AssignableMember[];
  canManage: boolean;
}) {
  const [seats, setSeats] = useState(initialSeats);
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const mutation = useMutation({
    mutationFn: (v: { seatId: string; occupantUserId: string | null }) => assignSeat(projectId, v.seatId, v.occupantUserId),
    onSuccess: (row) => {
      setSeats((all) => all.map((s) => (s.seatId === row.seatId ? row : s)));
      setMessage({ tone: "success", text: row.occupantName ? `${row.label} is now ${row.occupantName}'s seat.` : `${row.label} is unassigned.` });
    },
    onError: (error) => setMessage({ tone: "error", text: error instanceof ApiError ? error.message : "The seat could not be saved." }),
  });
  const [filter, setFilter] = useState("");
  const shown = seats.filter((s) => `${s.label} ${s.occupantName ?? ""}`.toLowerCase().includes(filter.trim().toLowerCase()));

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <label className="text-sm">
          <span className="mb-1 block font-medium">Find a seat or person</span>
          <input value={filter} onChange={(e) => setFilter(e.target.value)} className="rounded-md border border-line bg-white px-2.5 py-1.5" />
        </label>
        <p className="text-sm text-muted">
          {seats.filter((s) => s.removedInRevision === null).length} seats in the layout, {seats.filter((s) => s.occupantUserId).length} assigned
        </p>
      </div>
      <FormAlert tone={message?.tone}>{message?.text}</FormAlert>
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-line text-left text-muted">
            <th className="py-2 pr-3 font-medium">Seat</th>
            <th className="py-2 pr-3 font-medium">In the layout</th>
            <th className="py-2 font-medium">Occupant</th>
          </tr>
        </thead>
        <tbody>
          {shown.map((seat) => {
            const removed = seat.removedInRevision !== null;
            return (
              <tr key={seat.seatId} className="border-b border-line/60">
                <td className="py-1.5 pr-3 font-medium">{seat.label}</td>
                <td className="py-1.5 pr-3 text-muted">
                  {removed ? `removed in revision ${seat.removedInRevision}` : `since revision ${seat.firstRevision}`}
                </td>
                <td className="py-1.5">
                  {canManage && !removed ? (
                    <select
                      aria-label={`Occupant of ${seat.label}`}
                      value={seat.occupantUserId ?? ""}
                      disabled={mutation.isPending}
                      onChange={(e) => mutation.mutate({ seatId: seat.seatId, occupantUserId: e.target.value || null })}
                      className="rounded-md border border-line bg-white px-2 py-1"
                    >
                      <option value="">Unassigned</option>
                      {members.map((m) => (
                        <option key={m.userId} value={m.userId}>
                          {m.name} ({m.email})
                        </option>
                      ))}
                    </select>
                  ) : (
                    <span>{seat.occupantName ?? "Unassigned"}</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {shown.length === 0 ? <p className="text-sm text-muted">No seat matches “{filter}”.</p> : null}
    </div>
  );
}
