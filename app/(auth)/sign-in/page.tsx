import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { getCurrentMember } from "@/lib/auth/session";
import { HOME_BY_ROLE } from "@/lib/permissions";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage() {
  const member = await getCurrentMember();
  if (member) redirect(HOME_BY_ROLE[member.role]);
  return (
    <>
      <h1 className="mb-1 text-xl font-semibold">Sign in</h1>
      <p className="mb-6 text-sm text-muted">Welcome back. Use the e-mail address your organisation knows you by.</p>
      <SignInForm />
    </>
  );
}
