import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { getCurrentMember } from "@/lib/auth/session";
import { HOME_BY_ROLE } from "@/lib/permissions";

export const metadata: Metadata = { title: "Create an organisation" };

export default async function SignUpPage() {
  const member = await getCurrentMember();
  if (member) redirect(HOME_BY_ROLE[member.role]);
  return (
    <>
      <h1 className="mb-1 text-xl font-semibold">Create an organisation</h1>
      <p className="mb-6 text-sm text-muted">
        Start a Seatwise workspace for your firm or building. Joining a colleague&apos;s? Use the invitation link they sent you instead.
      </p>
      <SignUpForm />
    </>
  );
}
