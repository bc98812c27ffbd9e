/**
 * Jobs and the worker pool for real: the worker bundle is built from source into a temporary
 * folder (scripts/build-workers.mjs) and the pool runs it in worker threads. Cavity tables are
 * stored in a temporary LOUVER_CACHE_DIR.
 */
import { existsSync, readdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { GET as getJobRoute } from "@/app/api/jobs/[jobId]/route";
import { POST as cavityTableRoute } from "@/app/api/louvers/cavity-table/route";
import { GET as listProjects } from "@/app/api/projects/route";
import { getJob, JOB_TTL_MS, jobSettled, MAX_ACTIVE_JOBS_PER_ORGANISATION, startJob, type JobView } from "@/lib/jobs";
import { cachedLouverTable, clearLouverTableMemory, requestCavityTable, warmLouverTables } from "@/lib/louvers/cavity-table-cache";
import { buildLouverTable, type LouverTable } from "@/lib/panels/louverTable";
import { poolStats } from "@/lib/workers/pool";
import { call, organisationWithEveryRole } from "../support/api";
import { closeDatabase } from "../support/db";
import { openWorkerSandbox, type WorkerSandbox } from "@/tests/support/workers";

type Org = Awaited<ReturnType<typeof organisationWithEveryRole>>;
let org: Org;
let other: Org;
let sandbox: WorkerSandbox;

/** A table slow enough (a few seconds of radiosity solves) to watch a job run. */
const SLOW = { finish: "diffuse", wallEmissivity: 0.3, stepDeg: 1 } as const;

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function poll(token: string, jobId: string, seen: JobView[] = [], everyMs = 40): Promise<JobView[]> {
  for (;;) {
    const reply = await call<JobView>(getJobRoute, "GET", { token, params: { jobId } });
    expect(reply.status, JSON.stringify(reply.body)).toBe(200);
    seen.push(reply.body);
    if (reply.body.status === "done" || reply.body.status === "failed") return seen;
    await sleep(everyMs);
  }
}

beforeAll(async () => {
  sandbox = await openWorkerSandbox("jobs", "threads");
  [org, other] = await Promise.all([organisationWithEveryRole("jobs"), organisationWithEveryRole("jobs-other")]);
}, 60_000);

afterAll(async () => {
  await sandbox.close();
  await closeDatabase();
});

describe("POST /api/louvers/cavity-table → GET /api/jobs/{id}", () => {
  let jobId = "";
  let views: JobView[] = [];
  let loopTurns = 0;
  let requestWhileRunning: { status: number; jobStatus: string } | null = null;

  test("a table not computed before answers 202 with a job id at once", async () => {
    const reply = await call<{ jobId: string }>(cavityTableRoute, "POST", { token: org.designer.token, body: SLOW });
    expect(reply.status, JSON.stringify(reply.body)).toBe(202);
    expect(reply.body.jobId).toMatch(/^[0-9a-f-]{36}$/);
    expect(reply.response.headers.get("location")).toBe(`/api/jobs/${reply.body.jobId}`);
    // Answered without waiting for the table: when the reply is in, the job has not finished.
    expect(getJob(org.designer, reply.body.jobId).status).toMatch(/^(queued|running)$/);
    jobId = reply.body.jobId;
  });

  test("while the job runs, the event loop stays responsive and other requests complete", async () => {
    // Turns of the event loop (a 5 ms timer each) counted until the job ends. Were the table
    // computed on this thread, the loop would not turn at all while it ran.
    const sampling = (async () => {
      while (getJob(org.designer, jobId).status !== "done" && getJob(org.designer, jobId).status !== "failed") {
        await sleep(5);
        loopTurns += 1;
      }
    })();
    // A cheap request of another organisation, made while the table is being computed.
    await sleep(100);
    const projects = await call(listProjects, "GET", { token: other.designer.token });
    requestWhileRunning = { status: projects.status, jobStatus: getJob(org.designer, jobId).status };
    views = await poll(org.designer.token, jobId);
    await sampling;
    expect(requestWhileRunning).toEqual({ status: 200, jobStatus: "running" });
    expect(loopTurns).toBeGreaterThan(10);
  }, 60_000);

  test("progress only grows, through queued/running, and the job ends done", () => {
    expect(views.length).toBeGreaterThan(3);
    const order = { queued: 0, running: 1, done: 2, failed: 2 } as const;
    for (let i = 1; i < views.length; i++) {
      expect(order[views[i]!.status]).toBeGreaterThanOrEqual(order[views[i - 1]!.status]);
      expect(views[i]!.progress.done).toBeGreaterThanOrEqual(views[i - 1]!.progress.done);
    }
    const running = views.filter((v) => v.status === "running" && v.progress.total > 0);
    expect(running.length).toBeGreaterThan(1);
    expect(new Set(running.map((v) => v.progress.done)).size).toBeGreaterThan(1);
    expect(running[0]!.progress.stage).toMatch(/diffuse louver cavity/);
    const last = views.at(-1)!;
    expect(last.status).toBe("done");
    expect(last.progress.done).toBe(last.progress.total);
    expect(last.error).toBeUndefined();
  });

  test("the job's result equals building the table in-process", () => {
    const table = views.at(-1)!.result as LouverTable;
    expect(table).toEqual(buildLouverTable(SLOW));
    expect(table.anglesDeg).toHaveLength(176);
  });

  test("the table is then answered at once (200) from memory, and from disk after memory is cleared", async () => {
    await vi.waitFor(async () => expect(readdirSync(process.env.LOUVER_CACHE_DIR!)).toHaveLength(1));
    const expected = buildLouverTable(SLOW);
    const again = await call<{ table: LouverTable }>(cavityTableRoute, "POST", { token: other.admin.token, body: SLOW });
    expect(again.status).toBe(200);
    expect(again.body.table).toEqual(expected);
    clearLouverTableMemory();
    const fromDisk = await call<{ table: LouverTable }>(cavityTableRoute, "POST", { token: org.facility_manager.token, body: SLOW });
    expect(fromDisk.status).toBe(200);
    expect(fromDisk.body.table).toEqual(expected);
  });

  test("another organisation's job, and an unknown one, are 404; a malformed id is 400", async () => {
    for (const token of [other.admin.token, other.designer.token]) {
      const reply = await call(getJobRoute, "GET", { token, params: { jobId } });
      expect(reply.status).toBe(404);
      expect(reply.body.error).toBe("not_found");
      expect(JSON.stringify(reply.body)).not.toContain("anglesDeg");
    }
    expect((await call(getJobRoute, "GET", { token: org.admin.token, params: { jobId: crypto.randomUUID() } })).status).toBe(404);
    const malformed = await call(getJobRoute, "GET", { token: org.admin.token, params: { jobId: "../../etc" } });
    expect(malformed.status).toBe(400);
    expect(malformed.body.fields).toEqual([{ path: "params.jobId", message: "not a job id" }]);
  });

  test("an occupant may neither start nor read jobs (403)", async () => {
    expect((await call(getJobRoute, "GET", { token: org.occupant.token, params: { jobId } })).status).toBe(403);
    expect((await call(cavityTableRoute, "POST", { token: org.occupant.token, body: SLOW })).status).toBe(403);
  });
});

describe("runs are shared, jobs are not", () => {
  test("two organisations asking for the same new table get their own jobs on one computation", async () => {
    const params = { finish: "specular", wallEmissivity: 0.55, stepDeg: 0.5 } as const;
    const a = await requestCavityTable(org.designer, params);
    const b = await requestCavityTable(other.designer, params);
    expect("jobId" in a && "jobId" in b).toBe(true);
    const [ja, jb] = [(a as { jobId: string }).jobId, (b as { jobId: string }).jobId];
    expect(ja).not.toBe(jb);
    expect(poolStats().busy + poolStats().queued).toBeLessThanOrEqual(1);
    const [va, vb] = await Promise.all([jobSettled(org.designer, ja), jobSettled(other.designer, jb)]);
    expect(va.status).toBe("done");
    expect(vb.result).toEqual(va.result);
    expect(() => getJob(other.designer, ja)).toThrow(/No such job/);
  });
});

describe("job registry", () => {
  test("a failing task ends failed with its own message", async () => {
    const jobId = startJob(org.designer, "groove.table", { finish: "diffuse", wallEmissivity: 0.5, stepDeg: 0.05 });
    const view = await jobSettled(org.designer, jobId);
    expect(view.status).toBe("failed");
    expect(view.error).toMatch(/more than 2000 angles/);
    expect(view.result).toBeUndefined();
  });

  test("bad input is a 400 naming the fields, and no job is created", () => {
    expect(() => startJob(org.designer, "groove.trace", { openingAngleDeg: 400, wallEmissivity: 0.5, reflection: "diffuse" })).toThrow(
      expect.objectContaining({ code: "invalid_input", fields: [expect.objectContaining({ path: "openingAngleDeg" })] }),
    );
  });

  test("a finished job is kept for JOB_TTL_MS, then it is 404", async () => {
    const jobId = startJob(org.admin, "groove.trace", { openingAngleDeg: 90, wallEmissivity: 0.8, reflection: "diffuse", rays: 10_000 });
    expect((await jobSettled(org.admin, jobId)).status).toBe("done");
    const now = Date.now();
    const clock = vi.spyOn(Date, "now");
    try {
      clock.mockReturnValue(now + JOB_TTL_MS - 1_000);
      expect(getJob(org.admin, jobId).status).toBe("done");
      clock.mockReturnValue(now + JOB_TTL_MS + 1_000);
      expect(() => getJob(org.admin, jobId)).toThrow(/No such job/);
    } finally {
      clock.mockRestore();
    }
  });

  test(`an organisation may have ${MAX_ACTIVE_JOBS_PER_ORGANISATION} jobs going at once (then 503); others are unaffected`, async () => {
    const fresh = await organisationWithEveryRole("jobs-limit");
    const ids = Array.from({ length: MAX_ACTIVE_JOBS_PER_ORGANISATION }, (_, i) =>
      startJob(fresh.designer, "groove.trace", { openingAngleDeg: 30 + i, wallEmissivity: 0.4, reflection: "specular", rays: 200_000 }),
    );
    expect(() => startJob(fresh.admin, "groove.trace", { openingAngleDeg: 10, wallEmissivity: 0.4, reflection: "specular" })).toThrow(
      expect.objectContaining({ code: "unavailable" }),
    );
    const outsider = startJob(other.admin, "groove.trace", { openingAngleDeg: 10, wallEmissivity: 0.4, reflection: "specular", rays: 1_000 });
    await Promise.all([...ids.map((id) => jobSettled(fresh.designer, id)), jobSettled(other.admin, outsider)]);
    expect(getJob(other.admin, outsider).status).toBe("done");
  }, 60_000);
});

describe("warmLouverTables(list)", () => {
  test("computes what is missing, then loads it from disk, then answers from memory", async () => {
    const list = [{ finish: "specular", wallEmissivity: 0.9 }, { finish: "diffuse", wallEmissivity: 0.9, stepDeg: 10 }] as const;
    const first = await warmLouverTables(list);
    expect(first.map((e) => e.source)).toEqual(["computed", "computed"]);
    await vi.waitFor(() => expect(first.every((e) => existsSync(path.join(process.env.LOUVER_CACHE_DIR!, `${encodeURIComponent(e.key)}.json`)))).toBe(true));
    clearLouverTableMemory();
    expect((await warmLouverTables(list)).map((e) => e.source)).toEqual(["disk", "disk"]);
    expect((await warmLouverTables(list)).map((e) => e.source)).toEqual(["memory", "memory"]);
    expect(await cachedLouverTable(list[0])).toEqual(buildLouverTable(list[0]));
  }, 60_000);
});
