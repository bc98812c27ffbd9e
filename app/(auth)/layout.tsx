import Link from "next/link";
import type { ReactNode } from "react";
import { Wordmark } from "@/components/ui/wordmark";

/** Public pages (sign-in, sign-up, password reset, invitations): one narrow card, no app shell. */
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center px-4 py-12">
      <Link href="/" className="mb-8" aria-label="Seatwise home">
        <Wordmark className="text-xl" />
      </Link>
      <main className="w-full max-w-sm rounded-lg border border-line bg-white p-6 shadow-sm">{children}</main>
      <p className="mt-8 max-w-sm text-center text-xs text-muted">
        Seatwise plans localized radiant comfort: panels, seats and comfort zones on your floor plans.
      </p>
    </div>
  );
}
