/**
 * Comfort heatmap benchmark through the public functions.
 *
 * 9,600 points (30 m × 20 m floor plan at 0.25 m, seated height 0.6 m) ×
 * 60 surfaces (a 30 × 20 × 3 m room whose floor, ceiling and walls are split
 * into 60 rectangles with varied temperatures, including warm ceiling panels)
 * → for each point: small-sphere view factors to all 60 surfaces
 * (sphereToPolygon), fourth-power MRT, and PMV/PPD (pmvPpd).
 *
 * Run: npx tsx bench/heatmap.bench.ts
 * Prints wall time (median of several runs after a warm-up, one core), ns per
 * point–surface pair, and checksums (mean MRT, mean PMV) so the work cannot be
 * optimised away. No assertions on time.
 */
import { sphereToPolygon, type Vec3 } from "../lib/viewfactor";
import { pmvPpd, type PmvInput, type PmvResult } from "../lib/comfort";
import { medianTime } from "./support";

const ROOM_L_M = 30;
const ROOM_W_M = 20;
const ROOM_H_M = 3;
const GRID_STEP_M = 0.25;
const SEATED_CENTRE_HEIGHT_M = 0.6;
const KELVIN = 273.15;
const WARMUP_RUNS = 3;
const TIMED_RUNS = 9;

interface Surface {
  polygon: Vec3[];
  temperatureC: number;
}

/** 60 rectangles: floor 5 × 4, ceiling 5 × 4, long walls 6 + 6, short walls 4 + 4. */
function buildRoom(): Surface[] {
  const out: Surface[] = [];
  const [L, W, H] = [ROOM_L_M, ROOM_W_M, ROOM_H_M];
  for (let i = 0; i < 5; i++) {
    for (let j = 0; j < 4; j++) {
      const [x0, x1, y0, y1] = [(i * L) / 5, ((i + 1) * L) / 5, (j * W) / 4, ((j + 1) * W) / 4];
      out.push({ polygon: [[x0, y0, 0], [x1, y0, 0], [x1, y1, 0], [x0, y1, 0]], temperatureC: 20 + ((i + 2 * j) % 5) });
      // Every third ceiling tile is a warm radiant panel.
      const warm = (i + j) % 3 === 0;
      out.push({ polygon: [[x0, y0, H], [x1, y0, H], [x1, y1, H], [x0, y1, H]], temperatureC: warm ? 32 + i : 22 + 0.5 * j });
    }
  }
  for (let i = 0; i < 6; i++) {
    const [x0, x1] = [(i * L) / 6, ((i + 1) * L) / 6];
    out.push({ polygon: [[x0, 0, 0], [x1, 0, 0], [x1, 0, H], [x0, 0, H]], temperatureC: i % 2 === 0 ? 14 : 19 }); // glazing / wall
    out.push({ polygon: [[x0, W, 0], [x1, W, 0], [x1, W, H], [x0, W, H]], temperatureC: 21 });
  }
  for (let j = 0; j < 4; j++) {
    const [y0, y1] = [(j * W) / 4, ((j + 1) * W) / 4];
    out.push({ polygon: [[0, y0, 0], [0, y1, 0], [0, y1, H], [0, y0, H]], temperatureC: 18 + j });
    out.push({ polygon: [[L, y0, 0], [L, y1, 0], [L, y1, H], [L, y0, H]], temperatureC: 20 });
  }
  return out;
}

const surfaces = buildRoom();
const nx = Math.round(ROOM_L_M / GRID_STEP_M);
const ny = Math.round(ROOM_W_M / GRID_STEP_M);
const nPoints = nx * ny;
const nSurfaces = surfaces.length;
const polygons = surfaces.map((s) => s.polygon);
const t4 = Float64Array.from(surfaces, (s) => (s.temperatureC + KELVIN) ** 4);
const mrtMap = new Float64Array(nPoints);
const pmvMap = new Float64Array(nPoints);
const point: Vec3 = [0, 0, SEATED_CENTRE_HEIGHT_M];
const pmvInput: PmvInput = { ta: 22, tr: 22, vr: 0.1, rh: 50, met: 1.2, clo: 0.7 };
const pmvOut: PmvResult = { pmv: 0, ppd: 0, withinRange: true };

/** View factors + fourth-power MRT for every grid point. */
function mrtPass(): void {
  let k = 0;
  for (let i = 0; i < nx; i++) {
    point[0] = (i + 0.5) * GRID_STEP_M;
    for (let j = 0; j < ny; j++) {
      point[1] = (j + 0.5) * GRID_STEP_M;
      let fSum = 0;
      let fT4 = 0;
      for (let s = 0; s < nSurfaces; s++) {
        const f = sphereToPolygon(point, polygons[s] as Vec3[]);
        fSum += f;
        fT4 += f * (t4[s] as number);
      }
      mrtMap[k++] = Math.sqrt(Math.sqrt(fT4 / fSum)) - KELVIN;
    }
  }
}

/** PMV/PPD for every grid point from its MRT. */
function pmvPass(): void {
  for (let k = 0; k < nPoints; k++) {
    pmvInput.tr = mrtMap[k] as number;
    pmvMap[k] = pmvPpd(pmvInput, pmvOut).pmv;
  }
}

const totalMs = medianTime(
  () => {
    mrtPass();
    pmvPass();
  },
  WARMUP_RUNS,
  TIMED_RUNS,
);
const mrtMs = medianTime(mrtPass, WARMUP_RUNS, TIMED_RUNS);
const pmvMs = medianTime(pmvPass, WARMUP_RUNS, TIMED_RUNS);

let mrtSum = 0;
let pmvSum = 0;
let mrtMin = Infinity;
let mrtMax = -Infinity;
for (let k = 0; k < nPoints; k++) {
  const m = mrtMap[k] as number;
  mrtSum += m;
  pmvSum += pmvMap[k] as number;
  if (m < mrtMin) mrtMin = m;
  if (m > mrtMax) mrtMax = m;
}
const pairs = nPoints * nSurfaces;

console.log("Seatwise comfort heatmap benchmark (sphereToPolygon + fourth-power MRT + pmvPpd)");
console.log(`  grid: ${nx} × ${ny} = ${nPoints} points, ${nSurfaces} surfaces, ${pairs} point–surface pairs`);
console.log(`  runs: ${WARMUP_RUNS} warm-up, median of ${TIMED_RUNS}, one core, Node ${process.version}`);
console.log(`  total wall time (view factors + MRT + PMV): ${totalMs.toFixed(1)} ms   (goal ≤ 100 ms)`);
console.log(`    view factors + MRT: ${mrtMs.toFixed(1)} ms  → ${((mrtMs * 1e6) / pairs).toFixed(1)} ns per point–surface pair`);
console.log(`    PMV/PPD:            ${pmvMs.toFixed(1)} ms  → ${((pmvMs * 1e6) / nPoints).toFixed(0)} ns per point`);
console.log(`  throughput: ${(pairs / (mrtMs / 1000) / 1e6).toFixed(2)} M pairs/s`);
console.log(`  checksum: mean MRT ${(mrtSum / nPoints).toFixed(4)} °C (min ${mrtMin.toFixed(2)}, max ${mrtMax.toFixed(2)}), mean PMV ${(pmvSum / nPoints).toFixed(4)}`);
