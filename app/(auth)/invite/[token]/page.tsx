import type { Metadata } from "next";
import Link from "next/link";
import { AcceptInviteForm } from "@/components/auth/accept-invite-form";
import { FormAlert } from "@/components/ui/form-alert";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { acceptInviteInput } from "@/lib/auth/schemas";
import { describeInvitation } from "@/lib/auth/service";
import { AppError } from "@/lib/http/errors";

export const metadata: Metadata = { title: "Join an organisation" };

type Described = { ok: true; invitation: Awaited<ReturnType<typeof describeInvitation>> } | { ok: false; message: string };

/** The same read as GET /api/invitations/[token]: unknown links are 404, used or expired ones 410. */
async function describe(token: string): Promise<Described> {
  if (!acceptInviteInput.shape.token.safeParse(token).success) return { ok: false, message: "This invitation link is not valid." };
  try {
    return { ok: true, invitation: await describeInvitation(token) };
  } catch (error) {
    if (error instanceof AppError && (error.code === "not_found" || error.code === "gone")) return { ok: false, message: error.message };
    throw error;
  }
}

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const result = await describe(token);
  if (!result.ok) {
    return (
      <>
        <h1 className="mb-4 text-xl font-semibold">Join an organisation</h1>
        <FormAlert>{result.message}</FormAlert>
        <p className="mt-4 text-sm text-muted">
          Invitation links work once and for seven days. Ask the admin who invited you for a new one, or{" "}
          <Link href="/sign-in" className="text-accent-strong hover:underline">
            sign in
          </Link>{" "}
          if you have joined already.
        </p>
      </>
    );
  }
  const { invitation } = result;
  return (
    <>
      <h1 className="mb-1 text-xl font-semibold">Join {invitation.organisationName}</h1>
      <dl className="mb-6 mt-4 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md bg-paper p-3 text-sm">
        <dt className="text-muted">Organisation</dt>
        <dd>{invitation.organisationName}</dd>
        <dt className="text-muted">Role</dt>
        <dd>{ROLE_LABELS[invitation.role]}</dd>
        <dt className="text-muted">E-mail</dt>
        <dd className="break-all">{invitation.email}</dd>
      </dl>
      <AcceptInviteForm token={token} accountExists={invitation.accountExists} />
    </>
  );
}
