"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { applyApiError } from "@/components/ui/api-errors";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { FormField, SelectField } from "@/components/ui/form-field";
import { ROLE_LABELS, ROLES } from "@/lib/auth/roles";
import { inviteInput } from "@/lib/auth/schemas";
import { api } from "@/lib/client/query";

type Values = z.input<typeof inviteInput>;
const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

/** Creates an invitation and shows its link to pass on (sending it by e-mail comes later). */
export function InviteForm({ onInvited }: { onInvited: () => void }) {
  const [message, setMessage] = useState<string | null>(null);
  const [invite, setInvite] = useState<{ email: string; url: string } | null>(null);
  const [copied, setCopied] = useState(false);
  const form = useForm<Values, unknown, z.output<typeof inviteInput>>({
    resolver: zodResolver(inviteInput),
    defaultValues: { email: "", role: "occupant" },
  });
  const create = useMutation({
    mutationFn: (body: z.output<typeof inviteInput>) => api<{ inviteUrl: string }>("/api/members/invitations", { method: "POST", body }),
    onSuccess: ({ inviteUrl }, { email }) => {
      setInvite({ email, url: inviteUrl });
      form.reset({ email: "", role: form.getValues("role") });
      onInvited();
    },
    onError: (error) => setMessage(applyApiError(error, form.setError, ["email", "role"])),
  });
  const { errors } = form.formState;

  async function copy(url: string) {
    try {
      await navigator.clipboard.writeText(url);
      setCopied(true);
    } catch {
      setCopied(false);
    }
  }

  return (
    <section aria-labelledby="invite-heading" className="max-w-2xl space-y-4 rounded-lg border border-line bg-white p-4">
      <h2 id="invite-heading" className="text-lg font-semibold">
        Invite
      </h2>
      <form
        noValidate
        className="grid gap-4 sm:grid-cols-[1fr_12rem_auto] sm:items-start"
        onSubmit={form.handleSubmit((values) => {
          setMessage(null);
          setInvite(null);
          setCopied(false);
          create.mutate(values);
        })}
      >
        <FormField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...form.register("email")} />
        <SelectField label="Role" options={ROLE_OPTIONS} error={errors.role?.message} {...form.register("role")} />
        <Button type="submit" className="sm:mt-6" pending={create.isPending}>
          Create invite link
        </Button>
      </form>
      <FormAlert>{message}</FormAlert>
      {invite ? (
        <div className="space-y-2 rounded-md border border-accent/30 bg-accent/5 p-3">
          <p className="text-sm" role="status">
            Invitation for <span className="font-medium">{invite.email}</span> created. Send them this link; it works once, for seven days.
          </p>
          <div className="flex gap-2">
            <label htmlFor="invite-link" className="sr-only">
              Invite link
            </label>
            <input
              id="invite-link"
              readOnly
              value={invite.url}
              onFocus={(e) => e.currentTarget.select()}
              className="min-w-0 flex-1 rounded-md border border-line bg-white px-3 py-2 font-mono text-xs"
            />
            <Button variant="secondary" onClick={() => copy(invite.url)}>
              {copied ? "Copied" : "Copy"}
            </Button>
          </div>
        </div>
      ) : null}
    </section>
  );
}
