import type { ReactNode } from "react";

/**
 * A form's own message (the API's 401/409/410 answer, or a confirmation). Always rendered so
 * screen readers pick up changes to the live region.
 */
export function FormAlert({ tone = "error", children }: { tone?: "error" | "success"; children?: ReactNode }) {
  const filled = children !== null && children !== undefined && children !== false && children !== "";
  const style = tone === "error" ? "border-danger/30 bg-danger/5 text-danger" : "border-accent/30 bg-accent/5 text-accent-strong";
  return (
    <div role="status" aria-live="polite" className={filled ? `rounded-md border px-3 py-2 text-sm ${style}` : "sr-only"}>
      {filled ? children : null}
    </div>
  );
}
