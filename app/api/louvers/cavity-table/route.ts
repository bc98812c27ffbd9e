import { NextResponse } from "next/server";
import { memberRoute } from "@/lib/http/handler";
import { cavityTableRequest, requestCavityTable } from "@/lib/louvers/cavity-table-cache";

/**
 * A louver cavity table for `{ wallEmissivity, finish, stepDeg? }`: 200 `{ table }` when it is
 * stored, otherwise 202 `{ jobId }` — poll `GET /api/jobs/{jobId}` for progress and the table.
 */
export const POST = memberRoute("compute:run", { body: cavityTableRequest }, async ({ member, body }) => {
  const answer = await requestCavityTable(member, body);
  if ("table" in answer) return answer;
  return NextResponse.json(answer, { status: 202, headers: { location: `/api/jobs/${answer.jobId}` } });
});
