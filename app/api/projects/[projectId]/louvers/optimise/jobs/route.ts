import { NextResponse } from "next/server";
import { memberRoute } from "@/lib/http/handler";
import { optimiseRequest, startLouverOptimisationJob } from "@/lib/louvers/service";
import { projectIdParams } from "@/lib/projects/schemas";

/** Starts the louver optimisation as a job: 202 `{ jobId }`; poll `GET /api/jobs/{jobId}` for progress (per room) and the result. */
export const POST = memberRoute("compute:run", { params: projectIdParams, body: optimiseRequest }, async ({ member, params, body }) => {
  const answer = await startLouverOptimisationJob(member, params.projectId, body);
  return NextResponse.json(answer, { status: 202, headers: { location: `/api/jobs/${answer.jobId}` } });
});
