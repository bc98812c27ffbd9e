import Link from "next/link";
import type { ReactNode } from "react";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { NavLinks, type NavItem } from "@/components/ui/nav-links";
import { Wordmark } from "@/components/ui/wordmark";
import { requireMember } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { can, HOME_BY_ROLE, type Action } from "@/lib/permissions";

const NAV: ReadonlyArray<NavItem & { action: Action }> = [
  { href: "/projects", label: "Projects", action: "projects:read" },
  { href: "/catalogue", label: "Catalogue", action: "projects:read" },
  { href: "/members", label: "Members", action: "members:read" },
  { href: "/my-seats", label: "My seats", action: "own-seats:read" },
];

/**
 * The shell of every signed-in page. It sends visitors without a session to /sign-in, but each
 * page below checks its own permission with `requireMember(action)` as well.
 */
export default async function AppLayout({ children }: { children: ReactNode }) {
  const member = await requireMember();
  const items = NAV.filter((item) => can(member.role, item.action)).map(({ href, label }) => ({ href, label }));
  return (
    <div className="flex min-h-screen flex-col">
      <header className="no-print border-b border-line bg-white">
        <nav aria-label="Main" className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <Link href={HOME_BY_ROLE[member.role]} aria-label="Seatwise home">
            <Wordmark />
          </Link>
          <span className="border-l border-line pl-4 text-sm font-medium" data-testid="organisation-name">
            {member.organisationName}
          </span>
          <NavLinks items={items} />
          <div className="ml-auto flex items-center gap-3">
            <span className="text-right text-sm leading-tight">
              <span className="block font-medium">{member.name}</span>
              <span className="block text-xs text-muted">{ROLE_LABELS[member.role]}</span>
            </span>
            <SignOutButton />
          </div>
        </nav>
      </header>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-8">{children}</main>
      <footer className="border-t border-line">
        <p className="mx-auto max-w-6xl px-4 py-4 text-xs text-muted">
          Seatwise results are design estimates; they do not replace licensed engineering judgement or local codes.
        </p>
      </footer>
    </div>
  );
}
