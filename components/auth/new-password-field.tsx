import { FormField, type FormFieldProps } from "@/components/ui/form-field";
import { NEW_PASSWORD_MIN_CHARS } from "@/lib/auth/schemas";

type Props = Omit<FormFieldProps, "type" | "autoComplete" | "hint" | "label"> & {
  /** Field label; default "Password". */
  label?: string;
  /** Said after the length rule in the hint. */
  note?: string;
};

/** The password field of every form that sets a new password: its hint states the schema's length rule. */
export function NewPasswordField({ label = "Password", note, ...field }: Props) {
  const rule = `At least ${NEW_PASSWORD_MIN_CHARS} characters.`;
  return <FormField label={label} type="password" autoComplete="new-password" hint={note ? `${rule} ${note}` : rule} {...field} />;
}
