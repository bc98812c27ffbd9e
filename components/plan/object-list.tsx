"use client";

import { memo, type Dispatch } from "react";
import type { Layout } from "@/lib/layout/schema";
import type { EditorAction } from "@/lib/plan/editor";

interface Group {
  title: string;
  items: ReadonlyArray<{ id: string; label: string }>;
}

/** Every element by kind; clicking one selects it (Shift adds to the selection). */
export const ObjectList = memo(function ObjectList({ layout, selection, dispatch }: { layout: Layout; selection: readonly string[]; dispatch: Dispatch<EditorAction> }) {
  const roomName = new Map(layout.rooms.map((r) => [r.id, r.name]));
  const groups: Group[] = [
    { title: "Rooms", items: layout.rooms.map((r) => ({ id: r.id, label: r.name })) },
    { title: "Openings", items: layout.openings.map((o) => ({ id: o.id, label: `${o.kind === "window" ? "Window" : "Glazed door"} · ${roomName.get(o.roomId) ?? "?"} edge ${o.edgeIndex + 1}` })) },
    { title: "Panels", items: layout.panels.map((p) => ({ id: p.id, label: p.label })) },
    { title: "Seats", items: layout.seats.map((s) => ({ id: s.id, label: s.label })) },
    { title: "Zones", items: layout.zones.map((z) => ({ id: z.id, label: z.name })) },
  ];
  return (
    <nav aria-label="Objects" className="space-y-3 text-sm">
      {groups.map((g) => (
        <section key={g.title}>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-muted">
            {g.title} <span className="font-normal">({g.items.length})</span>
          </h3>
          {g.items.length === 0 ? (
            <p className="text-xs text-muted">None yet.</p>
          ) : (
            <ul className="mt-1 max-h-48 space-y-0.5 overflow-y-auto">
              {g.items.map((item) => {
                const selected = selection.includes(item.id);
                return (
                  <li key={item.id}>
                    <button
                      type="button"
                      aria-pressed={selected}
                      onClick={(e) => dispatch({ type: "select", ids: [item.id], mode: e.shiftKey ? "toggle" : "replace" })}
                      className={`w-full truncate rounded px-2 py-1 text-left ${selected ? "bg-accent/10 font-medium text-accent-strong" : "hover:bg-line/40"}`}
                    >
                      {item.label}
                    </button>
                  </li>
                );
              })}
            </ul>
          )}
        </section>
      ))}
    </nav>
  );
});
