import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, test } from "vitest";
import { JobProgress } from "@/components/jobs/job-progress";

const render = (props: Parameters<typeof JobProgress>[0]) => renderToStaticMarkup(createElement(JobProgress, props));

describe("JobProgress({ label, status, progress, error })", () => {
  test("a running job shows done of total on a labelled bar and its stage in a live region", () => {
    const html = render({ label: "Cavity table", status: "running", progress: { done: 48, total: 176, stage: "Tabulating the diffuse louver cavity" } });
    expect(html).toContain('role="progressbar"');
    expect(html).toContain('aria-label="Cavity table progress"');
    expect(html).toContain('aria-valuenow="27"');
    expect(html).toContain('aria-valuetext="48 of 176"');
    expect(html).toMatch(/role="status" aria-live="polite"[^>]*>.*Tabulating the diffuse louver cavity.*\(48 of 176\)/);
  });

  test("a queued job says it waits; a done job is full", () => {
    expect(render({ label: "Cavity table", status: "queued", progress: undefined })).toContain("Waiting for a free compute thread");
    const done = render({ label: "Cavity table", status: "done", progress: { done: 176, total: 176, stage: "done" } });
    expect(done).toContain('aria-valuenow="100"');
    expect(done).toContain("Done");
  });

  test("a failed job shows its error", () => {
    const html = render({ label: "Cavity table", status: "failed", progress: { done: 3, total: 10, stage: "x" }, error: "the table would have more than 2000 angles" });
    expect(html).toContain("the table would have more than 2000 angles");
    expect(html).toContain("text-danger");
  });
});
