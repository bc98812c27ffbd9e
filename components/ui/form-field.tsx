import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from "react";

const CONTROL =
  "block w-full rounded-md border border-line bg-white px-3 py-2 text-sm text-ink shadow-xs focus:border-accent focus:outline-2 focus:outline-accent/30 aria-[invalid=true]:border-danger";

interface FieldFrameProps {
  id: string;
  label: string;
  error?: string;
  hint?: ReactNode;
  children: ReactNode;
}

/** Label above the control, an optional hint, and the field's error in its own live region. */
function FieldFrame({ id, label, error, hint, children }: FieldFrameProps) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-ink">
        {label}
      </label>
      {children}
      {hint ? (
        <p id={`${id}-hint`} className="text-xs text-muted">
          {hint}
        </p>
      ) : null}
      <p id={`${id}-error`} aria-live="polite" className="min-h-0 text-sm text-danger">
        {error}
      </p>
    </div>
  );
}

function describedBy(id: string, error?: string, hint?: ReactNode): string | undefined {
  return [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ") || undefined;
}

export interface FormFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  error?: string;
  hint?: ReactNode;
}

/** A labelled input with an inline error; spread react-hook-form's `register(name)` into it. */
export function FormField({ label, error, hint, id, className = "", ...input }: FormFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <FieldFrame id={fieldId} label={label} error={error} hint={hint}>
      <input
        id={fieldId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, error, hint)}
        className={`${CONTROL} ${className}`}
        {...input}
      />
    </FieldFrame>
  );
}

export interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  error?: string;
  hint?: ReactNode;
  options: ReadonlyArray<{ value: string; label: string }>;
}

export function SelectField({ label, error, hint, id, options, className = "", ...select }: SelectFieldProps) {
  const autoId = useId();
  const fieldId = id ?? autoId;
  return (
    <FieldFrame id={fieldId} label={label} error={error} hint={hint}>
      <select
        id={fieldId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, error, hint)}
        className={`${CONTROL} ${className}`}
        {...select}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldFrame>
  );
}
