import { passwordResetRequestInput } from "@/lib/auth/schemas";
import { requestPasswordReset } from "@/lib/auth/service";
import { publicRoute } from "@/lib/http/handler";
import { publicOrigin } from "@/lib/http/origin";

/** Always 202, known address or not; the link goes out by e-mail. */
export const POST = publicRoute({ body: passwordResetRequestInput, status: 202 }, async ({ body, req }) => {
  await requestPasswordReset(body.email, publicOrigin(req));
  return { message: "If the address has an account, a reset link is on its way." };
});
