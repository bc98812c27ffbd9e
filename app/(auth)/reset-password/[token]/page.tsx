import type { Metadata } from "next";
import Link from "next/link";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { FormAlert } from "@/components/ui/form-alert";
import { passwordResetConfirmInput } from "@/lib/auth/schemas";

export const metadata: Metadata = { title: "Set a new password" };

/** Whether the link is unknown, expired or used is the API's answer when the form is sent. */
export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const wellFormed = passwordResetConfirmInput.shape.token.safeParse(token).success;
  return (
    <>
      <h1 className="mb-1 text-xl font-semibold">Set a new password</h1>
      {wellFormed ? (
        <>
          <p className="mb-6 text-sm text-muted">Choose a password you do not use anywhere else.</p>
          <ResetPasswordForm token={token} />
        </>
      ) : (
        <div className="mt-4 space-y-4">
          <FormAlert>This reset link is not valid.</FormAlert>
          <Link href="/forgot-password" className="block text-sm text-accent-strong hover:underline">
            Ask for a new reset link
          </Link>
        </div>
      )}
    </>
  );
}
