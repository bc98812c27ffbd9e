import type { ButtonHTMLAttributes } from "react";

const VARIANTS = {
  primary: "bg-accent text-white hover:bg-accent-strong disabled:bg-muted",
  secondary: "border border-line bg-white text-ink hover:border-accent hover:text-accent-strong disabled:text-muted",
  danger: "border border-danger/40 bg-white text-danger hover:bg-danger hover:text-white disabled:text-muted",
  quiet: "text-muted hover:text-ink underline-offset-4 hover:underline disabled:text-line",
} as const;

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: keyof typeof VARIANTS;
  /** Disables the button and tells assistive technology that work is under way. */
  pending?: boolean;
}

export function Button({ variant = "primary", pending = false, disabled, className = "", type = "button", children, ...rest }: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={`inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-medium transition-colors focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent disabled:cursor-not-allowed ${VARIANTS[variant]} ${className}`}
      {...rest}
    >
      {children}
    </button>
  );
}
