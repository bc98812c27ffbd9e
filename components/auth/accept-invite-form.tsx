"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { FormField } from "@/components/ui/form-field";
import { NewPasswordField } from "@/components/auth/new-password-field";
import { applyApiError } from "@/components/ui/api-errors";
import { acceptInviteInput, type AcceptInviteInput } from "@/lib/auth/schemas";
import { api } from "@/lib/client/query";

/** A new account needs a name and a password; the token comes from the URL. */
const newAccountSchema = acceptInviteInput.omit({ token: true });
/** An existing account proves itself with its current password. */
const existingAccountSchema = acceptInviteInput.pick({ password: true });

/**
 * The accept endpoint requires `name` in every request but ignores it when the invited e-mail
 * has an account already (the account keeps its name), so this form sends a stand-in.
 */
const NAME_OF_EXISTING_ACCOUNT = "existing account";

function useAcceptInvitation(onError: (error: unknown) => void) {
  const router = useRouter();
  return useMutation({
    mutationFn: (body: AcceptInviteInput) => api<{ home: string }>("/api/invitations/accept", { method: "POST", body }),
    onSuccess: ({ home }) => {
      router.replace(home);
      router.refresh();
    },
    onError,
  });
}

export function AcceptInviteForm({ token, accountExists }: { token: string; accountExists: boolean }) {
  return accountExists ? <ExistingAccountForm token={token} /> : <NewAccountForm token={token} />;
}

function NewAccountForm({ token }: { token: string }) {
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<z.input<typeof newAccountSchema>, unknown, z.output<typeof newAccountSchema>>({
    resolver: zodResolver(newAccountSchema),
    defaultValues: { name: "", password: "" },
  });
  const accept = useAcceptInvitation((error) => setMessage(applyApiError(error, form.setError, ["name", "password"])));
  const { errors } = form.formState;
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit((values) => {
        setMessage(null);
        accept.mutate({ ...values, token });
      })}
    >
      <FormField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <NewPasswordField error={errors.password?.message} {...form.register("password")} />
      <FormAlert>{message}</FormAlert>
      <Button type="submit" className="w-full" pending={accept.isPending || accept.isSuccess}>
        Join organisation
      </Button>
    </form>
  );
}

function ExistingAccountForm({ token }: { token: string }) {
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<z.input<typeof existingAccountSchema>, unknown, z.output<typeof existingAccountSchema>>({
    resolver: zodResolver(existingAccountSchema),
    defaultValues: { password: "" },
  });
  const accept = useAcceptInvitation((error) => setMessage(applyApiError(error, form.setError, ["password"])));
  const { errors } = form.formState;
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit((values) => {
        setMessage(null);
        accept.mutate({ ...values, name: NAME_OF_EXISTING_ACCOUNT, token });
      })}
    >
      <p className="text-sm text-muted">This e-mail address has a Seatwise account already. Enter its current password to join.</p>
      <FormField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register("password")}
      />
      <FormAlert>{message}</FormAlert>
      <Button type="submit" className="w-full" pending={accept.isPending || accept.isSuccess}>
        Join organisation
      </Button>
    </form>
  );
}
