import { describe, expect, test } from "vitest";
import { checkProgress, createProgressReporter, progressFraction, type Progress } from "@/lib/workers/progress";

describe("checkProgress(progress)", () => {
  test.each([
    { progress: { done: 0, total: 0, stage: "waiting" } },
    { progress: { done: 3, total: 10, stage: "tracing" } },
    { progress: { done: 10, total: 10, stage: "done" } },
  ])("accepts $progress", ({ progress }) => {
    expect(checkProgress(progress)).toEqual(progress);
  });

  const bad: { name: string; progress: Progress }[] = [
    { name: "done above total", progress: { done: 11, total: 10, stage: "x" } },
    { name: "negative done", progress: { done: -1, total: 10, stage: "x" } },
    { name: "fractional done", progress: { done: 1.5, total: 10, stage: "x" } },
    { name: "NaN total", progress: { done: 0, total: Number.NaN, stage: "x" } },
    { name: "infinite total", progress: { done: 0, total: Infinity, stage: "x" } },
    { name: "blank stage", progress: { done: 0, total: 1, stage: "  " } },
    { name: "over-long stage", progress: { done: 0, total: 1, stage: "x".repeat(121) } },
  ];
  test.each(bad)("throws RangeError for $name", ({ progress }) => {
    expect(() => checkProgress(progress)).toThrow(RangeError);
  });
});

describe("progressFraction(progress)", () => {
  test("is done / total, and 0 while the total is unknown", () => {
    expect(progressFraction({ done: 3, total: 12, stage: "x" })).toBe(0.25);
    expect(progressFraction({ done: 0, total: 0, stage: "x" })).toBe(0);
  });
});

describe("createProgressReporter(post, { minIntervalMs, now })", () => {
  function harness(minIntervalMs = 100) {
    let clock = 0;
    const posted: Progress[] = [];
    const reporter = createProgressReporter((p) => posted.push(p), { minIntervalMs, now: () => clock });
    return { reporter, posted, advance: (ms: number) => (clock += ms) };
  }

  test("posts the first report at once and holds back reports inside the interval", () => {
    const { reporter, posted, advance } = harness();
    reporter.report({ done: 0, total: 100, stage: "a" });
    for (let i = 1; i <= 50; i++) {
      advance(1);
      reporter.report({ done: i, total: 100, stage: "a" });
    }
    expect(posted).toEqual([{ done: 0, total: 100, stage: "a" }]);
    advance(60); // 110 ms after the first post
    reporter.report({ done: 51, total: 100, stage: "a" });
    expect(posted.map((p) => p.done)).toEqual([0, 51]);
  });

  test("posts a stage change and completion at once, whatever the interval", () => {
    const { reporter, posted } = harness(10_000);
    reporter.report({ done: 0, total: 4, stage: "first" });
    reporter.report({ done: 1, total: 4, stage: "first" });
    reporter.report({ done: 2, total: 4, stage: "second" });
    reporter.report({ done: 3, total: 4, stage: "second" });
    reporter.report({ done: 4, total: 4, stage: "second" });
    expect(posted.map((p) => `${p.stage}:${p.done}`)).toEqual(["first:0", "second:2", "second:4"]);
  });

  test("flush() posts the newest held report once", () => {
    const { reporter, posted } = harness(10_000);
    reporter.report({ done: 0, total: 9, stage: "a" });
    reporter.report({ done: 5, total: 9, stage: "a" });
    reporter.report({ done: 7, total: 9, stage: "a" });
    reporter.flush();
    reporter.flush();
    expect(posted.map((p) => p.done)).toEqual([0, 7]);
  });

  test("refuses progress that goes backwards, and malformed reports", () => {
    const { reporter } = harness();
    reporter.report({ done: 5, total: 9, stage: "a" });
    expect(() => reporter.report({ done: 4, total: 9, stage: "a" })).toThrow(/backwards/);
    expect(() => reporter.report({ done: 10, total: 9, stage: "a" })).toThrow(RangeError);
  });
});
