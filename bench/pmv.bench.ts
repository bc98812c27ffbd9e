/**
 * PMV throughput: lib/comfort `pmvPpd` against a line-for-line port of the ISO 7730:2005
 * Annex D program (bench/reference/iso7730-annex-d.ts), same inputs, same process.
 *
 * Run: npx tsx bench/pmv.bench.ts
 */
import { performance } from "node:perf_hooks";
import { pmvPpd, type PmvInput, type PmvResult } from "../lib/comfort";
import { createRng } from "../lib/viewfactor/rng";
import { iso7730AnnexD } from "./reference/iso7730-annex-d";
import { median } from "./support";

const ROWS = 100_000;
const WARMUP_ROUNDS = 3;
const ROUNDS = 11;


function makeRows(n: number): PmvInput[] {
  const rng = createRng(7730); // deterministic inputs across runs
  const rnd = () => rng.next();
  const rows: PmvInput[] = new Array<PmvInput>(n);
  for (let i = 0; i < n; i++) {
    // ISO 7730:2005 clause 4.1 ranges.
    rows[i] = {
      ta: 10 + 20 * rnd(),
      tr: 10 + 30 * rnd(),
      vr: rnd(),
      rh: 10 + 80 * rnd(),
      met: 0.8 + 3.2 * rnd(),
      clo: 2 * rnd(),
      wme: 0,
    };
  }
  return rows;
}

let sink = 0;

/**
 * Independent high-precision PMV for the accuracy line: ISO 7730:2005 eqs. (1)–(4) with the
 * clothing temperature found by plain bisection of eq. (2) to 1e-11 K (no Newton, no
 * Annex D iteration), Annex D conventions for pa and the sweating term.
 */
function pmvByBisection(r: PmvInput): number {
  const pa = r.rh * 10 * Math.exp(16.6536 - 4030.183 / (r.ta + 235));
  const icl = 0.155 * r.clo;
  const m = r.met * 58.15;
  const mw = m - (r.wme ?? 0) * 58.15;
  const fcl = icl <= 0.078 ? 1 + 1.29 * icl : 1.05 + 0.645 * icl;
  const hcf = 12.1 * Math.sqrt(r.vr);
  const taK = r.ta + 273;
  const trK = r.tr + 273;
  const hcAt = (tK: number): number => Math.max(hcf, 2.38 * Math.abs(tK - taK) ** 0.25);
  const f = (tK: number): number =>
    tK - 273 - (35.7 - 0.028 * mw) + icl * fcl * (3.96e-8 * (tK ** 4 - trK ** 4) + hcAt(tK) * (tK - taK));
  let lo = 200;
  let hi = 400;
  while (hi - lo > 1e-11) {
    const mid = 0.5 * (lo + hi);
    if (f(mid) > 0) hi = mid;
    else lo = mid;
  }
  const tK = 0.5 * (lo + hi);
  const hl =
    3.05e-3 * (5733 - 6.99 * mw - pa) +
    (mw > 58.15 ? 0.42 * (mw - 58.15) : 0) +
    1.7e-5 * m * (5867 - pa) +
    0.0014 * m * (34 - r.ta) +
    3.96e-8 * fcl * (tK ** 4 - trK ** 4) +
    fcl * hcAt(tK) * (tK - taK);
  return (0.303 * Math.exp(-0.036 * m) + 0.028) * (mw - hl);
}

function runReference(rows: ReadonlyArray<PmvInput>): number {
  let acc = 0;
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i] as PmvInput;
    acc += iso7730AnnexD(r.clo, r.met, r.wme ?? 0, r.ta, r.tr, r.vr, r.rh).pmv;
  }
  return acc;
}

function runLibrary(rows: ReadonlyArray<PmvInput>): number {
  let acc = 0;
  for (let i = 0; i < rows.length; i++) {
    acc += pmvPpd(rows[i] as PmvInput).pmv;
  }
  return acc;
}

function runLibraryOut(rows: ReadonlyArray<PmvInput>): number {
  const out: PmvResult = { pmv: 0, ppd: 0, withinRange: false };
  let acc = 0;
  for (let i = 0; i < rows.length; i++) {
    acc += pmvPpd(rows[i] as PmvInput, out).pmv;
  }
  return acc;
}

function timeMs(fn: (rows: ReadonlyArray<PmvInput>) => number, rows: ReadonlyArray<PmvInput>): number {
  const t0 = performance.now();
  sink += fn(rows);
  return performance.now() - t0;
}

const rows = makeRows(ROWS);

// Accuracy: max |ΔPMV| and |ΔPPD| between the two on every row.
let maxDPmv = 0;
let maxDPpd = 0;
let refFailures = 0;
let maxLibVsExact = 0;
let maxRefVsExact = 0;
for (let i = 0; i < rows.length; i += 10) {
  const r = rows[i] as PmvInput;
  const exact = pmvByBisection(r);
  maxLibVsExact = Math.max(maxLibVsExact, Math.abs(pmvPpd(r).pmv - exact));
  const ref = iso7730AnnexD(r.clo, r.met, r.wme ?? 0, r.ta, r.tr, r.vr, r.rh).pmv;
  if (ref !== 999999) maxRefVsExact = Math.max(maxRefVsExact, Math.abs(ref - exact));
}
for (const r of rows) {
  const a = iso7730AnnexD(r.clo, r.met, r.wme ?? 0, r.ta, r.tr, r.vr, r.rh);
  const b = pmvPpd(r);
  if (a.pmv === 999999) {
    refFailures++;
    continue;
  }
  maxDPmv = Math.max(maxDPmv, Math.abs(a.pmv - b.pmv));
  maxDPpd = Math.max(maxDPpd, Math.abs(a.ppd - b.ppd));
}

const cases: Array<[string, (rows: ReadonlyArray<PmvInput>) => number]> = [
  ["Annex D port (baseline)", runReference],
  ["pmvPpd (new result object)", runLibrary],
  ["pmvPpd (reused out object)", runLibraryOut],
];
const times = new Map<string, number[]>(cases.map(([name]) => [name, []]));
for (let round = 0; round < WARMUP_ROUNDS + ROUNDS; round++) {
  // Rotate the order each round so no case always runs first.
  for (let k = 0; k < cases.length; k++) {
    const [name, fn] = cases[(k + round) % cases.length] as [string, (rows: ReadonlyArray<PmvInput>) => number];
    const ms = timeMs(fn, rows);
    if (round >= WARMUP_ROUNDS) {
      (times.get(name) as number[]).push(ms);
    }
  }
}

const baseMs = median(times.get("Annex D port (baseline)") as number[]);
console.log("PMV benchmark — pmvPpd vs ISO 7730:2005 Annex D port");
console.log(`rows: ${ROWS} (seeded, ISO 7730 clause 4.1 ranges), rounds: ${ROUNDS} after ${WARMUP_ROUNDS} warm-up, node ${process.version}`);
for (const [name] of cases) {
  const ms = median(times.get(name) as number[]);
  const opsPerS = (ROWS / ms) * 1000;
  console.log(
    `${name.padEnd(28)} median ${ms.toFixed(2).padStart(8)} ms  ${(opsPerS / 1e6).toFixed(2).padStart(6)} M evals/s  speed-up ×${(baseMs / ms).toFixed(2)}`,
  );
}
console.log(`max |ΔPMV| vs Annex D port: ${maxDPmv.toExponential(2)}   max |ΔPPD|: ${maxDPpd.toExponential(2)} %`);
console.log(
  `max |ΔPMV| vs bisection solution of eq. (2) (every 10th row): pmvPpd ${maxLibVsExact.toExponential(2)}, Annex D port ${maxRefVsExact.toExponential(2)}`,
);
console.log(`Annex D port non-converged rows (PMV = 999999): ${refFailures}`);
console.log(`(checksum ${sink.toFixed(3)})`);
