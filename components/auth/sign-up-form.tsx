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
import { NewPasswordField } from "@/components/auth/new-password-field";
import { applyApiError } from "@/components/ui/api-errors";
import { signUpInput } from "@/lib/auth/schemas";
import { api } from "@/lib/client/query";

type Values = z.input<typeof signUpInput>;

export function SignUpForm() {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof signUpInput>>({
    resolver: zodResolver(signUpInput),
    defaultValues: { name: "", email: "", password: "", organisationName: "" },
  });
  const signUp = useMutation({
    mutationFn: (body: z.output<typeof signUpInput>) => api<{ home: string }>("/api/auth/sign-up", { method: "POST", body }),
    onSuccess: ({ home }) => {
      router.replace(home);
      router.refresh();
    },
    onError: (error) => setMessage(applyApiError(error, form.setError, ["name", "email", "password", "organisationName"])),
  });
  const { errors } = form.formState;

  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit((values) => {
        setMessage(null);
        signUp.mutate(values);
      })}
    >
      <FormField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <FormField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <NewPasswordField error={errors.password?.message} {...form.register("password")} />
      <FormField
        label="Organisation name"
        autoComplete="organization"
        hint="You become its admin and can invite colleagues afterwards."
        error={errors.organisationName?.message}
        {...form.register("organisationName")}
      />
      <FormAlert>{message}</FormAlert>
      <Button type="submit" className="w-full" pending={signUp.isPending || signUp.isSuccess}>
        Create organisation
      </Button>
      <p className="text-sm text-muted">
        Have an account?{" "}
        <Link href="/sign-in" className="text-accent-strong hover:underline">
          Sign in
        </Link>
      </p>
    </form>
  );
}
