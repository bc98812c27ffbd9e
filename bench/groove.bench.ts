/**
 * V-groove apparent emissivity: Monte Carlo tracer throughput (ray–wall
 * bounces per second), rays and time to reach a standard error of 0.002,
 * and the deterministic solvers' run times.
 *
 * Run: npx tsx bench/groove.bench.ts
 */
import {
  grooveEmissivityDiffuseRadiosity,
  grooveEmissivitySpecularUnfolded,
  parallelPlateChannelEmissivity,
  traceGroove,
  type GrooveReflection,
} from "../lib/viewfactor/groove";
import { medianTime } from "./support";

const TARGET_SE = 0.002;

const pad = (s: string, n: number): string => s.padEnd(n);
const fmt = (x: number, d = 1): string => x.toFixed(d);

console.log("V-groove apparent emissivity (lib/viewfactor/groove)");
console.log("====================================================");

// 1. Throughput.
console.log("\nTracer throughput, 200 000 rays (median of 5 runs after 2 warm-up runs)");
console.log(`${pad("case", 28)}${pad("bounces/ray", 13)}${pad("ms", 9)}M bounces/s`);
const throughputCases: Array<[number, number, GrooveReflection]> = [
  [10, 0.1, "diffuse"],
  [60, 0.5, "diffuse"],
  [120, 0.9, "diffuse"],
  [10, 0.1, "specular"],
  [60, 0.5, "specular"],
];
for (const [openingAngleDeg, wallEmissivity, reflection] of throughputCases) {
  let bounces = 0;
  let rays = 0;
  const ms = medianTime(
    () => {
      const r = traceGroove({ openingAngleDeg, wallEmissivity, reflection, rays: 200_000 });
      bounces = r.bounces;
      rays = r.rays;
    },
    2,
    5,
  );
  console.log(
    `${pad(`${reflection} ${openingAngleDeg}°, ε=${wallEmissivity}`, 28)}${pad(fmt(bounces / rays, 2), 13)}${pad(fmt(ms), 9)}${fmt(bounces / ms / 1e3)}`,
  );
}

// 2. Rays and time to a standard error of 0.002.
console.log(`\nRays and time to reach a standard error of ${TARGET_SE} (pilot of 20 000 rays, then SE ∝ 1/√N)`);
console.log(`${pad("case", 28)}${pad("rays", 10)}${pad("SE reached", 12)}ms`);
const seCases: Array<[number, number, GrooveReflection]> = [
  [60, 0.5, "diffuse"],
  [60, 0.5, "specular"],
  [10, 0.1, "diffuse"],
  [30, 0.3, "specular"],
];
for (const [openingAngleDeg, wallEmissivity, reflection] of seCases) {
  const pilot = traceGroove({ openingAngleDeg, wallEmissivity, reflection, rays: 20_000 });
  const rays = Math.max(18, Math.ceil(20_000 * (pilot.standardError / TARGET_SE) ** 2));
  let se = 0;
  const ms = medianTime(
    () => {
      se = traceGroove({ openingAngleDeg, wallEmissivity, reflection, rays, seed: 2 }).standardError;
    },
    2,
    7,
  );
  console.log(`${pad(`${reflection} ${openingAngleDeg}°, ε=${wallEmissivity}`, 28)}${pad(String(rays), 10)}${pad(se.toFixed(5), 12)}${fmt(ms, 2)}`);
}

// 3. Deterministic solvers.
console.log("\nDeterministic solvers (median of 5 runs after 1 warm-up run)");
console.log(`${pad("solver", 58)}ms`);
const det: Array<[string, () => unknown]> = [
  ["radiosity, diffuse 60°, ε=0.5, 128+256 strips (default)", () => grooveEmissivityDiffuseRadiosity({ openingAngleDeg: 60, wallEmissivity: 0.5 })],
  ["radiosity, diffuse 60°, ε=0.5, 256+512 strips", () => grooveEmissivityDiffuseRadiosity({ openingAngleDeg: 60, wallEmissivity: 0.5, strips: 512 })],
  ["unfolding, specular 60°, ε=0.5", () => grooveEmissivitySpecularUnfolded({ openingAngleDeg: 60, wallEmissivity: 0.5 })],
  ["unfolding, specular 10°, ε=0.5", () => grooveEmissivitySpecularUnfolded({ openingAngleDeg: 10, wallEmissivity: 0.5 })],
  ["unfolding, specular 1°, ε=0.5", () => grooveEmissivitySpecularUnfolded({ openingAngleDeg: 1, wallEmissivity: 0.5 })],
  ["parallel-plate channel, ε=0.5, depth 200, 128+256 strips", () => parallelPlateChannelEmissivity({ wallEmissivity: 0.5 })],
];
for (const [name, fn] of det) console.log(`${pad(name, 58)}${fmt(medianTime(fn, 1, 5), 2)}`);
