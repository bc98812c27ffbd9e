/** The Seatwise wordmark: ink lettering with a teal seat-back mark. */
export function Wordmark({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 font-semibold tracking-tight text-ink ${className}`}>
      <svg aria-hidden="true" viewBox="0 0 16 16" className="size-4">
        <path d="M3 2h3v7h7v3H3z" className="fill-accent" />
        <path d="M4 13h2v2H4zm6 0h2v2h-2z" className="fill-ink" />
      </svg>
      Seatwise
    </span>
  );
}
