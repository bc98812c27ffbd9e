import { z } from "zod";
import { describeInvitation } from "@/lib/auth/service";
import { publicRoute } from "@/lib/http/handler";

export const GET = publicRoute({ params: z.strictObject({ token: z.string().min(10).max(100) }) }, ({ params }) =>
  describeInvitation(params.token),
);
