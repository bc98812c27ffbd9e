"use client";

import { useRouter } from "next/navigation";
import { startTransition, useEffect } from "react";
import { Button } from "@/components/ui/button";

/** Catches errors of signed-in pages; "Try again" re-renders the segment from the server. */
export default function AppError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  const router = useRouter();
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <section role="alert" className="max-w-prose space-y-3">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="text-muted">
        This page could not be shown. Nothing you saved is lost. Try again; if it keeps happening, tell your admin the reference below.
      </p>
      {error.digest ? <p className="font-mono text-xs text-muted">Reference: {error.digest}</p> : null}
      <Button
        onClick={() =>
          startTransition(() => {
            router.refresh();
            reset();
          })
        }
      >
        Try again
      </Button>
    </section>
  );
}
