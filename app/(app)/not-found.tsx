import Link from "next/link";

/**
 * Shown inside the app shell for unknown or other organisations' ids, and for pages the
 * member's role may not open (`requireMember` answers those with notFound as well).
 */
export default function AppNotFound() {
  return (
    <section className="max-w-prose space-y-3">
      <h1 className="text-2xl font-semibold">Not available</h1>
      <p className="text-muted">
        This page does not exist in your organisation, or your role does not give access to it. If you followed a link from a colleague, ask
        them or your organisation&apos;s admin.
      </p>
      <Link href="/" className="inline-block text-sm font-medium text-accent-strong hover:underline">
        Go to your start page
      </Link>
    </section>
  );
}
