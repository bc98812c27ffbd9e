import { passwordResetConfirmInput } from "@/lib/auth/schemas";
import { resetPassword } from "@/lib/auth/service";
import { publicRoute } from "@/lib/http/handler";

export const POST = publicRoute({ body: passwordResetConfirmInput }, async ({ body }) => {
  await resetPassword(body.token, body.password);
  return { message: "Password changed. Sign in with the new password." };
});
