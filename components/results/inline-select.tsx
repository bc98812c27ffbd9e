"use client";

import { useId, type ReactNode, type SelectHTMLAttributes } from "react";

/** A compact labelled select for toolbars (label tied by id, so its name is the label alone). */
export function InlineSelect({ label, children, className = "", ...select }: SelectHTMLAttributes<HTMLSelectElement> & { label: string; children: ReactNode }) {
  const id = useId();
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium">
        {label}
      </label>
      <select id={id} className={`rounded-md border border-line bg-white px-2 py-1.5 text-sm ${className}`} {...select}>
        {children}
      </select>
    </div>
  );
}
