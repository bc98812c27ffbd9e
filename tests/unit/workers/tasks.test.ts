import { describe, expect, test } from "vitest";
import { buildLouverTable, type LouverTableParams } from "@/lib/panels/louverTable";
import { traceGroove } from "@/lib/viewfactor";
import { runLouverTable } from "@/lib/workers/louver-table-task";
import type { Progress } from "@/lib/workers/progress";
import { isTaskName, taskDefinition, TASKS, type TaskName } from "@/lib/workers/tasks";

const NAMES = Object.keys(TASKS) as TaskName[];

function collect(): { reports: Progress[]; report: (p: Progress) => void } {
  const reports: Progress[] = [];
  return { reports, report: (p) => reports.push({ ...p }) };
}

/** done never decreases, total stays the same, and the last report is complete. */
function expectMonotoneToCompletion(reports: readonly Progress[]): void {
  expect(reports.length).toBeGreaterThanOrEqual(2);
  const total = reports[0]!.total;
  expect(total).toBeGreaterThan(0);
  for (let i = 1; i < reports.length; i++) {
    expect(reports[i]!.total).toBe(total);
    expect(reports[i]!.done).toBeGreaterThanOrEqual(reports[i - 1]!.done);
  }
  expect(reports.at(-1)!.done).toBe(total);
}

describe("TASKS (the task registry)", () => {
  test("names the cavity tasks, each with an input schema and a run function", () => {
    expect(NAMES).toEqual(expect.arrayContaining(["groove.trace", "groove.table"]));
    for (const name of NAMES) {
      expect(isTaskName(name)).toBe(true);
      expect(typeof taskDefinition(name).run).toBe("function");
      expect(typeof taskDefinition(name).input.safeParse).toBe("function");
    }
  });

  test("isTaskName refuses names that are not entries (including inherited keys)", () => {
    for (const name of ["louvers.unknown", "", "toString", "__proto__", 5, null]) expect(isTaskName(name)).toBe(false);
  });
});

describe('"groove.trace"', () => {
  const input = { openingAngleDeg: 60, wallEmissivity: 0.5, reflection: "diffuse" as const, rays: 20_000, seed: 7 };

  test("run(input, report) equals traceGroove(input) and reports start and end", () => {
    const { reports, report } = collect();
    const output = taskDefinition("groove.trace").run(input, report);
    expect(output).toEqual(traceGroove(input));
    expectMonotoneToCompletion(reports);
  });

  test.each([
    { name: "angle 0", patch: { openingAngleDeg: 0 }, path: "openingAngleDeg" },
    { name: "angle above 180", patch: { openingAngleDeg: 181 }, path: "openingAngleDeg" },
    { name: "emissivity 1.2", patch: { wallEmissivity: 1.2 }, path: "wallEmissivity" },
    { name: "an unknown reflection law", patch: { reflection: "glossy" }, path: "reflection" },
    { name: "too many rays", patch: { rays: 50_000_000 }, path: "rays" },
    { name: "fractional rays", patch: { rays: 10.5 }, path: "rays" },
    { name: "an unknown field", patch: { colour: "red" }, path: "" },
  ])("the input schema refuses $name", ({ patch, path }) => {
    const result = TASKS["groove.trace"].input.safeParse({ ...input, ...patch });
    expect(result.success).toBe(false);
    expect(result.error!.issues.map((i) => i.path.join("."))).toContain(path);
  });
});

describe('"groove.table" — runLouverTable(params, report)', () => {
  const cases: { name: string; params: LouverTableParams }[] = [
    { name: "diffuse walls, default 5° step", params: { finish: "diffuse", wallEmissivity: 0.9 } },
    { name: "specular walls, default 1° step", params: { finish: "specular", wallEmissivity: 0.1 } },
    { name: "an odd range and step (last step shorter)", params: { finish: "diffuse", wallEmissivity: 0.5, stepDeg: 8, minDeg: 10, maxDeg: 170 } },
    { name: "a step not exact in binary (falls back to one call)", params: { finish: "specular", wallEmissivity: 0.3, stepDeg: 0.1, minDeg: 60, maxDeg: 70 } },
    { name: "Monte Carlo solver", params: { finish: "diffuse", wallEmissivity: 0.5, solver: "montecarlo", rays: 5_000, stepDeg: 15 } },
  ];
  test.each(cases)("equals buildLouverTable for $name, with monotone progress to the angle count", ({ params }) => {
    const { reports, report } = collect();
    const table = runLouverTable(params, report);
    const direct = buildLouverTable(params);
    expect(table).toEqual(direct);
    expectMonotoneToCompletion(reports);
    expect(reports[0]!.total).toBe(direct.anglesDeg.length);
    expect(reports[0]!.stage).toMatch(new RegExp(params.finish));
  });

  test("reports several steps for a table of many angles", () => {
    const { reports, report } = collect();
    runLouverTable({ finish: "specular", wallEmissivity: 0.9 }, report);
    expect(new Set(reports.map((r) => r.done)).size).toBeGreaterThan(10);
  });

  test("the input schema refuses bad parameters, naming each field", () => {
    const result = TASKS["groove.table"].input.safeParse({ finish: "matte", wallEmissivity: 0, stepDeg: -1, minDeg: 100, maxDeg: 90, extra: 1 });
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((i) => i.path.join(".") || i.code);
    expect(paths).toEqual(expect.arrayContaining(["finish", "wallEmissivity", "stepDeg", "unrecognized_keys"]));
    const reversed = TASKS["groove.table"].input.safeParse({ finish: "diffuse", wallEmissivity: 0.5, minDeg: 100, maxDeg: 90 });
    expect(reversed.error!.issues.map((i) => i.path.join("."))).toEqual(["minDeg"]);
  });

  test("parameters the schema lets through but the table refuses throw RangeError", () => {
    expect(() => runLouverTable({ finish: "diffuse", wallEmissivity: 0.5, stepDeg: 0.05 }, () => {})).toThrow(RangeError);
  });
});
