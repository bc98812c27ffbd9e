import { getJob, jobIdParams } from "@/lib/jobs";
import { memberRoute } from "@/lib/http/handler";

/** A job's state: `{ id, task, status, progress: { done, total, stage }, result?, error? }`; other organisations' jobs are 404. */
export const GET = memberRoute("compute:run", { params: jobIdParams }, async ({ member, params }) => getJob(member, params.jobId));
