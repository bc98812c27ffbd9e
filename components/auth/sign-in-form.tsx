"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { FormField } from "@/components/ui/form-field";
import { applyApiError } from "@/components/ui/api-errors";
import { signInInput } from "@/lib/auth/schemas";
import { api } from "@/lib/client/query";

type Values = z.input<typeof signInInput>;

export function SignInForm() {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof signInInput>>({
    resolver: zodResolver(signInInput),
    defaultValues: { email: "", password: "" },
  });
  const signIn = useMutation({
    mutationFn: (body: z.output<typeof signInInput>) => api<{ home: string }>("/api/auth/sign-in", { method: "POST", body }),
    onSuccess: ({ home }) => {
      router.replace(home);
      router.refresh();
    },
    onError: (error) => setMessage(applyApiError(error, form.setError, ["email", "password"])),
  });
  const { errors } = form.formState;

  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit((values) => {
        setMessage(null);
        signIn.mutate(values);
      })}
    >
      <FormField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <FormField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...form.register("password")} />
      <FormAlert>{message}</FormAlert>
      <Button type="submit" className="w-full" pending={signIn.isPending || signIn.isSuccess}>
        Sign in
      </Button>
      <div className="flex justify-between text-sm">
        <Link href="/forgot-password" className="text-accent-strong hover:underline">
          Forgot your password?
        </Link>
        <Link href="/sign-up" className="text-accent-strong hover:underline">
          Create an organisation
        </Link>
      </div>
    </form>
  );
}
