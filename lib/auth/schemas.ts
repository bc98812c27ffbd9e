/** Auth and membership input schemas, shared by the route handlers and the forms. */
import { z } from "zod";
import { ROLES } from "@/lib/auth/roles";

export const email = z.email("enter a valid e-mail address").max(254).transform((s) => s.trim().toLowerCase());
/** Shortest and longest new password, characters (forms show the minimum as a hint). */
export const NEW_PASSWORD_MIN_CHARS = 10;
export const NEW_PASSWORD_MAX_CHARS = 128;
export const newPassword = z
  .string()
  .min(NEW_PASSWORD_MIN_CHARS, `use at least ${NEW_PASSWORD_MIN_CHARS} characters`)
  .max(NEW_PASSWORD_MAX_CHARS, `use at most ${NEW_PASSWORD_MAX_CHARS} characters`);
const personName = z.string().trim().min(1, "enter a name").max(120);

export const signInInput = z.strictObject({ email, password: z.string().min(1, "enter your password").max(128) });
export const signUpInput = z.strictObject({
  name: personName,
  email,
  password: newPassword,
  organisationName: z.string().trim().min(2, "enter your organisation's name").max(120),
});
export const inviteInput = z.strictObject({ email, role: z.enum(ROLES) });
export const acceptInviteInput = z.strictObject({
  token: z.string().min(10).max(100),
  name: personName,
  password: newPassword,
});
export const passwordResetRequestInput = z.strictObject({ email });
export const passwordResetConfirmInput = z.strictObject({ token: z.string().min(10).max(100), password: newPassword });
export const roleChangeInput = z.strictObject({ role: z.enum(ROLES) });

export type SignInInput = z.infer<typeof signInInput>;
export type SignUpInput = z.infer<typeof signUpInput>;
export type InviteInput = z.infer<typeof inviteInput>;
export type AcceptInviteInput = z.infer<typeof acceptInviteInput>;
