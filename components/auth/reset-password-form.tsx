"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { NewPasswordField } from "@/components/auth/new-password-field";
import { applyApiError } from "@/components/ui/api-errors";
import { passwordResetConfirmInput } from "@/lib/auth/schemas";
import { api, ApiError } from "@/lib/client/query";

/** The token comes from the URL; the form asks only for the password. */
const formSchema = passwordResetConfirmInput.omit({ token: true });
type Values = z.input<typeof formSchema>;

export function ResetPasswordForm({ token }: { token: string }) {
  const [message, setMessage] = useState<string | null>(null);
  const [linkDead, setLinkDead] = useState(false);
  const form = useForm<Values, unknown, z.output<typeof formSchema>>({
    resolver: zodResolver(formSchema),
    defaultValues: { password: "" },
  });
  const confirm = useMutation({
    mutationFn: (values: z.output<typeof formSchema>) =>
      api<{ message: string }>("/api/auth/password-reset/confirm", { method: "POST", body: { ...values, token } }),
    onError: (error) => {
      // 404 (unknown link) and 410 (expired or used): the user needs a new link, not a new password.
      setLinkDead(error instanceof ApiError && (error.status === 404 || error.status === 410));
      setMessage(applyApiError(error, form.setError, ["password"]));
    },
  });
  const { errors } = form.formState;

  if (confirm.isSuccess) {
    return (
      <div className="space-y-4">
        <FormAlert tone="success">{confirm.data.message}</FormAlert>
        <Link href="/sign-in" className="inline-block text-sm font-medium text-accent-strong hover:underline">
          Go to sign in
        </Link>
      </div>
    );
  }

  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit((values) => {
        setMessage(null);
        confirm.mutate(values);
      })}
    >
      <NewPasswordField label="New password" note="Every device signed in to your account is signed out." error={errors.password?.message} {...form.register("password")} />
      <FormAlert>{message}</FormAlert>
      {linkDead ? (
        <Link href="/forgot-password" className="block text-sm text-accent-strong hover:underline">
          Ask for a new reset link
        </Link>
      ) : null}
      <Button type="submit" className="w-full" pending={confirm.isPending}>
        Set new password
      </Button>
    </form>
  );
}
