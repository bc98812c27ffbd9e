import Link from "next/link";
import { Wordmark } from "@/components/ui/wordmark";

export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-screen max-w-prose flex-col justify-center gap-4 px-4">
      <Wordmark className="text-xl" />
      <h1 className="text-2xl font-semibold">Page not found</h1>
      <p className="text-muted">There is nothing at this address. Check the link, or start again from your home page.</p>
      <Link href="/" className="text-sm font-medium text-accent-strong hover:underline">
        Go to Seatwise
      </Link>
    </main>
  );
}
