import { memberRoute } from "@/lib/http/handler";
import { listOwnSeats } from "@/lib/seats";

export const GET = memberRoute("own-seats:read", {}, async ({ member }) => ({ seats: await listOwnSeats(member) }));
