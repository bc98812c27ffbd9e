"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { FormField } from "@/components/ui/form-field";
import { applyApiError } from "@/components/ui/api-errors";
import { passwordResetRequestInput } from "@/lib/auth/schemas";
import { api } from "@/lib/client/query";

type Values = z.input<typeof passwordResetRequestInput>;

export function ForgotPasswordForm() {
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof passwordResetRequestInput>>({
    resolver: zodResolver(passwordResetRequestInput),
    defaultValues: { email: "" },
  });
  const request = useMutation({
    mutationFn: (body: z.output<typeof passwordResetRequestInput>) =>
      api<{ message: string }>("/api/auth/password-reset/request", { method: "POST", body }),
    onError: (error) => setMessage(applyApiError(error, form.setError, ["email"])),
  });
  const { errors } = form.formState;

  if (request.isSuccess) {
    return (
      <div className="space-y-4">
        <FormAlert tone="success">{request.data.message} The link works once, for one hour.</FormAlert>
        <Link href="/sign-in" className="text-sm text-accent-strong hover:underline">
          Back to sign in
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
        request.mutate(values);
      })}
    >
      <FormField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <FormAlert>{message}</FormAlert>
      <Button type="submit" className="w-full" pending={request.isPending}>
        Send reset link
      </Button>
      <Link href="/sign-in" className="block text-sm text-accent-strong hover:underline">
        Back to sign in
      </Link>
    </form>
  );
}
