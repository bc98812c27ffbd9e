/**
 * Louvered panels: time to build a cavity table per finish (default steps), lookup cost per
 * call, and the table's interpolation error (mid-steps vs direct solves).
 *
 * Run: npx tsx bench/louver.bench.ts
 */
import { performance } from "node:perf_hooks";
import {
  buildLouverTable,
  louverDirectionalEmissivity,
  louverEmissivityAt,
  louverExitAngleDeg,
  louverFaceEmissivityAt,
  type LouverEmissivity,
  type LouverFinish,
  type LouverTable,
} from "../lib/panels";
import { grooveEmissivityDiffuseRadiosity, grooveEmissivitySpecularUnfolded } from "../lib/viewfactor";

const pad = (s: string, n: number): string => s.padEnd(n);

function direct(finish: LouverFinish, openingAngleDeg: number, wallEmissivity: number): { h: number; bins: number[] } {
  const r =
    finish === "diffuse"
      ? grooveEmissivityDiffuseRadiosity({ openingAngleDeg, wallEmissivity })
      : grooveEmissivitySpecularUnfolded({ openingAngleDeg, wallEmissivity });
  return { h: r.hemispherical, bins: r.binEmissivity };
}

console.log("Louvered panels (lib/panels/louver*)");
console.log("====================================");

// 1. Table build time per finish at the default steps (5° diffuse, 1° specular), 5°–180°.
console.log("\nTable build, default steps, 5°–180° (one run each)");
console.log(`${pad("finish, ε", 22)}${pad("angles", 8)}${pad("ms", 10)}max solver error`);
const tables: Array<[LouverFinish, number, LouverTable]> = [];
for (const finish of ["diffuse", "specular"] as const) {
  for (const wallEmissivity of [0.05, 0.9]) {
    const t0 = performance.now();
    const table = buildLouverTable({ wallEmissivity, finish });
    const ms = performance.now() - t0;
    tables.push([finish, wallEmissivity, table]);
    console.log(`${pad(`${finish}, ${wallEmissivity}`, 22)}${pad(String(table.anglesDeg.length), 8)}${pad(ms.toFixed(0), 10)}${Math.max(...table.solverError).toExponential(1)}`);
  }
}

// 2. Lookup cost per call.
console.log("\nLookup cost (ns per call, 2 000 000 calls, reused output records)");
const [, , diffuseTable] = tables[1] as [LouverFinish, number, LouverTable];
const [, , specularTable] = tables[3] as [LouverFinish, number, LouverTable];
const out: LouverEmissivity = { hemispherical: 0, directional: new Array<number>(9).fill(0), withinTable: true };
const N = 2_000_000;
let sink = 0;
const cases: Array<[string, (i: number) => void]> = [
  ["louverEmissivityAt, diffuse (36 angles)", (i) => (sink += louverEmissivityAt(diffuseTable, (i * 0.37) % 180, out).hemispherical)],
  ["louverEmissivityAt, specular (176 angles)", (i) => (sink += louverEmissivityAt(specularTable, (i * 0.37) % 180, out).hemispherical)],
  ["louverFaceEmissivityAt, diffuse", (i) => (sink += louverFaceEmissivityAt(diffuseTable, (i * 0.37) % 180, "hinged-blades", out).hemispherical)],
  ["louverExitAngleDeg", (i) => (sink += louverExitAngleDeg([0, 0, -1], [1, 0, 0], [(i % 7) - 3, (i % 5) - 2, -2]))],
  ["louverDirectionalEmissivity", (i) => (sink += louverDirectionalEmissivity(out, (i * 0.013) % 90))],
];
for (const [name, fn] of cases) {
  for (let i = 0; i < 200_000; i++) fn(i);
  const t0 = performance.now();
  for (let i = 0; i < N; i++) fn(i);
  const ns = ((performance.now() - t0) * 1e6) / N;
  console.log(`${pad(name, 46)}${ns.toFixed(1)}`);
}

// 3. Interpolation error at mid-steps (hemispherical and directional bins).
console.log("\nInterpolation error at mid-steps vs direct solve (max over 5°–180°)");
console.log(`${pad("finish, ε, step", 28)}${pad("hemispherical", 16)}${pad("at °", 8)}directional bins`);
const errCases: Array<[LouverFinish, number, number | undefined]> = [
  ["diffuse", 0.05, undefined],
  ["diffuse", 0.5, undefined],
  ["diffuse", 0.9, undefined],
  ["specular", 0.05, undefined],
  ["specular", 0.3, undefined],
  ["specular", 0.9, undefined],
  ["specular", 0.05, 5],
];
for (const [finish, wallEmissivity, stepDeg] of errCases) {
  const table = buildLouverTable({ wallEmissivity, finish, stepDeg });
  let maxH = 0;
  let at = 0;
  let maxD = 0;
  for (let i = 0; i + 1 < table.anglesDeg.length; i++) {
    const mid = 0.5 * ((table.anglesDeg[i] as number) + (table.anglesDeg[i + 1] as number));
    const ref = direct(finish, mid, wallEmissivity);
    const got = louverEmissivityAt(table, mid);
    const e = Math.abs(got.hemispherical - ref.h);
    if (e > maxH) {
      maxH = e;
      at = mid;
    }
    for (let k = 0; k < 9; k++) maxD = Math.max(maxD, Math.abs((got.directional[k] as number) - (ref.bins[k] as number)));
  }
  const step = stepDeg ?? (finish === "diffuse" ? 5 : 1);
  console.log(`${pad(`${finish}, ${wallEmissivity}, ${step}°`, 28)}${pad(maxH.toFixed(5), 16)}${pad(at.toFixed(1), 8)}${maxD.toFixed(5)}`);
}
if (sink === 42) console.log("");
