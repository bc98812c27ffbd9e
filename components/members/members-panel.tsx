"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { InviteForm } from "@/components/members/invite-form";
import { membersQuery, type MembersData } from "@/components/members/queries";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { Button } from "@/components/ui/button";
import { DateTime } from "@/components/ui/date-time";
import { FormAlert } from "@/components/ui/form-alert";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/auth/roles";
import { api } from "@/lib/client/query";

const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

interface Props {
  /** Rendered by the server page, so the table shows without a loading state. */
  initialData: MembersData;
  canManage: boolean;
  currentUserId: string;
}

export function MembersPanel({ initialData, canManage, currentUserId }: Props) {
  const queryClient = useQueryClient();
  const { data } = useQuery({ ...membersQuery(), initialData });
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const invalidate = () => queryClient.invalidateQueries({ queryKey: membersQuery().queryKey });
  // The message appears together with the refreshed table, never ahead of it.
  const report = (tone: "error" | "success", text: string) => invalidate().then(() => setMessage({ tone, text }));
  const reportError = (error: unknown) => report("error", apiErrorMessage(error));

  const changeRole = useMutation({
    mutationFn: ({ membershipId, role }: { membershipId: string; role: Role; name: string }) =>
      api(`/api/members/${membershipId}`, { method: "PATCH", body: { role } }),
    onSuccess: (_data, { name, role }) => report("success", `${name} is now ${ROLE_LABELS[role].toLowerCase()}.`),
    onError: reportError,
  });
  const remove = useMutation({
    mutationFn: ({ membershipId }: { membershipId: string; name: string }) => api(`/api/members/${membershipId}`, { method: "DELETE" }),
    onSuccess: (_data, { name }) => report("success", `${name} was removed from the organisation.`),
    onError: reportError,
  });
  const revoke = useMutation({
    mutationFn: ({ id }: { id: string; email: string }) => api(`/api/members/invitations/${id}`, { method: "DELETE" }),
    onSuccess: (_data, { email }) => report("success", `The invitation for ${email} was revoked; its link no longer works.`),
    onError: reportError,
  });
  const busy = changeRole.isPending || remove.isPending || revoke.isPending;

  return (
    <div className="space-y-10">
      <section aria-labelledby="members-heading" className="space-y-3">
        <h2 id="members-heading" className="text-lg font-semibold">
          Members <span className="font-normal text-muted">({data.members.length})</span>
        </h2>
        <FormAlert tone={message?.tone}>{message?.text}</FormAlert>
        <div className="overflow-x-auto rounded-lg border border-line bg-white">
          <table className="w-full text-left text-sm">
            <thead className="border-b border-line text-xs uppercase tracking-wide text-muted">
              <tr>
                <th scope="col" className="px-4 py-2 font-medium">
                  Name
                </th>
                <th scope="col" className="px-4 py-2 font-medium">
                  E-mail
                </th>
                <th scope="col" className="px-4 py-2 font-medium">
                  Role
                </th>
                {canManage ? (
                  <th scope="col" className="px-4 py-2 font-medium">
                    <span className="sr-only">Actions</span>
                  </th>
                ) : null}
              </tr>
            </thead>
            <tbody className="divide-y divide-line">
              {data.members.map((m) => (
                <tr key={m.membershipId}>
                  <td className="px-4 py-2 font-medium">
                    {m.name}
                    {m.userId === currentUserId ? <span className="ml-1 font-normal text-muted">(you)</span> : null}
                  </td>
                  <td className="px-4 py-2 break-all">{m.email}</td>
                  <td className="px-4 py-2">
                    {canManage ? (
                      <select
                        aria-label={`Role of ${m.name}`}
                        value={m.role}
                        disabled={busy}
                        onChange={(e) => {
                          setMessage(null);
                          changeRole.mutate({ membershipId: m.membershipId, role: e.target.value as Role, name: m.name });
                        }}
                        className="rounded-md border border-line bg-white px-2 py-1"
                      >
                        {ROLE_OPTIONS.map((o) => (
                          <option key={o.value} value={o.value}>
                            {o.label}
                          </option>
                        ))}
                      </select>
                    ) : (
                      ROLE_LABELS[m.role]
                    )}
                  </td>
                  {canManage ? (
                    <td className="px-4 py-2 text-right">
                      <Button
                        variant="danger"
                        className="px-2.5 py-1"
                        disabled={busy}
                        aria-label={`Remove ${m.name}`}
                        onClick={() => {
                          setMessage(null);
                          if (window.confirm(`Remove ${m.name} (${m.email}) from the organisation? They are signed out at once.`)) {
                            remove.mutate({ membershipId: m.membershipId, name: m.name });
                          }
                        }}
                      >
                        Remove
                      </Button>
                    </td>
                  ) : null}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="invitations-heading" className="space-y-3">
        <h2 id="invitations-heading" className="text-lg font-semibold">
          Pending invitations
        </h2>
        {data.invitations.length === 0 ? (
          <p className="text-sm text-muted">No invitations are waiting. Invite a colleague below; their link stays valid for seven days.</p>
        ) : (
          <ul className="divide-y divide-line rounded-lg border border-line bg-white text-sm">
            {data.invitations.map((inv) => (
              <li key={inv.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-2">
                <span>
                  <span className="font-medium break-all">{inv.email}</span> · {ROLE_LABELS[inv.role]} ·{" "}
                  <span className="text-muted">
                    expires <DateTime iso={inv.expiresAt} />
                  </span>
                </span>
                {canManage ? (
                  <Button
                    variant="secondary"
                    className="px-2.5 py-1"
                    disabled={busy}
                    aria-label={`Revoke invitation for ${inv.email}`}
                    onClick={() => {
                      setMessage(null);
                      revoke.mutate({ id: inv.id, email: inv.email });
                    }}
                  >
                    Revoke
                  </Button>
                ) : null}
              </li>
            ))}
          </ul>
        )}
      </section>

      {canManage ? <InviteForm onInvited={invalidate} /> : null}
    </div>
  );
}
