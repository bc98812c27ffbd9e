/**
 * The louver search: given a precomputed problem (optimise-problem.ts), choose each active
 * louvered panel's opening angle so that every target seat is inside its zones' PMV targets
 * with the least total panel output — or, where that cannot be done, the least total
 * violation first and then the least output, with a reason per seat left outside.
 *
 * Pure, deterministic (no randomness, fixed iteration order, ties go to the first candidate
 * found) and free of plan geometry and I/O, so it runs in a worker thread
 * (lib/workers/tasks.ts, "louvers.optimise").
 *
 * Method, per room (rooms are separate radiant enclosures: a panel affects only its room's
 * seats):
 * - exhaustive when the product of the panels' candidate counts is at most
 *   {@link EXHAUSTIVE_LIMIT}: every combination on the angle grid, lexicographic minimum of
 *   (violation, output), with pruning on output once a feasible combination is known —
 *   exact on the grid;
 * - heuristic otherwise: start with every panel at its lowest-output candidate; greedy moves
 *   (one panel to any candidate; pairs of panels when the room is small enough) picking the
 *   largest drop in violation per watt added, until every seat is inside or no move helps;
 *   then a descent that tries to step each panel down to a lower-output candidate (then pairs)
 *   without increasing the violation, repeated to a fixed point.
 *
 * Violation of a seat: Σ over its zone targets of how far its PMV lies outside the interval
 * (a strict category bound counts 1e-9 when met with equality). The search never leaves the
 * candidate grid, so no angle outside a panel's allowed range is ever returned.
 */
import { pmvPpd, type PmvResult } from "../comfort";
import type { ReportProgress } from "../workers/progress";
import type { LouverProblem, PmvConstraint, ProblemPanel, ProblemSeat } from "./optimise-problem";

/** Largest number of angle combinations a room is searched exhaustively over. */
export const EXHAUSTIVE_LIMIT = 200_000;
/** Pair moves of the heuristic are tried while Σ over panel pairs of C_i·C_j stays below this. */
export const PAIR_MOVE_LIMIT = 5_000;
/** Rooms with at most this many candidate angles (summed over panels) try every single move. */
export const ALL_SINGLE_MOVES_LIMIT = 120;
/** Violations below this count as none (PMV units). */
const VIOLATION_EPS = 1e-12;
/** Output differences below this count as equal, W. */
const OUTPUT_EPS_W = 1e-9;

export type SearchMethod = "auto" | "exhaustive" | "heuristic";

export interface SearchOptions {
  /** "auto" (default): exhaustive when the room has at most `exhaustiveLimit` combinations, else heuristic. */
  method?: SearchMethod;
  /** Default {@link EXHAUSTIVE_LIMIT}. */
  exhaustiveLimit?: number;
}

export type UnreachableCode =
  | "no_louvered_panel"
  | "targets_conflict"
  | "needs_more_output"
  | "too_warm_at_lowest_output"
  | "needs_more_cooling"
  | "too_cool_at_lowest_output"
  | "conflicts_with_other_seats";

export interface OptimisedPanel {
  id: string;
  label: string;
  roomId: string;
  mode: "heating" | "cooling";
  /** The chosen setting, degrees, within [minAngleDeg, maxAngleDeg]. */
  openingAngleDeg: number;
  /** Output at the chosen setting, W. */
  outputW: number;
  previousAngleDeg: number;
  previousOutputW: number;
  minAngleDeg: number;
  maxAngleDeg: number;
}

export interface OptimisedSeat {
  id: string;
  label: string;
  roomId: string;
  zoneIds: string[];
  /** PMV at the layout's current settings and at the chosen ones. */
  pmvBefore: number;
  pmvAfter: number;
  inTargetBefore: boolean;
  inTarget: boolean;
}

export interface UnreachableSeat {
  seatId: string;
  code: UnreachableCode;
  reason: string;
}

export interface RoomSearch {
  roomId: string;
  method: "exhaustive" | "heuristic" | "none";
  /** Product of the panels' candidate counts. */
  combinations: number;
  /** Seat PMV evaluations spent. */
  evaluations: number;
}

export interface LouverOptimisation {
  /** Every active louvered panel, in layout order. */
  panels: OptimisedPanel[];
  /** Every target seat, in layout order. */
  seats: OptimisedSeat[];
  unreachable: UnreachableSeat[];
  /** Σ outputW of `panels` at the chosen settings and at the current ones, W. */
  totalOutputW: number;
  totalOutputBeforeW: number;
  rooms: RoomSearch[];
}

function round(x: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
}

/** How far a PMV lies outside a seat's targets (0 inside). */
export function pmvViolation(pmv: number, constraints: ReadonlyArray<PmvConstraint>): number {
  let v = 0;
  for (const c of constraints) {
    if (pmv < c.lo) v += c.lo - pmv;
    else if (pmv > c.hi) v += pmv - c.hi;
    else if (c.strict && (pmv === c.lo || pmv === c.hi)) v += 1e-9;
  }
  return v;
}

/** Evaluates seats' PMV for given candidate choices (one index per problem panel). */
class SeatEvaluator {
  evaluations = 0;
  private readonly input = { ta: 0, tr: 0, vr: 0, rh: 0, met: 0, clo: 0 };
  private readonly result: PmvResult = { pmv: 0, ppd: 0, withinRange: true };

  /** PMV of `seat` with the linked panels at `t4Of(link)`, K⁴. */
  pmvWith(seat: Readonly<ProblemSeat>, t4Of: (linkIndex: number) => number): number {
    let mrtK = 0;
    for (let d = 0; d < 6; d++) {
      let sum = seat.baseT4[d]!;
      for (let k = 0; k < seat.links.length; k++) sum += seat.links[k]!.factors[d]! * t4Of(k);
      const fs = seat.factorSum[d]!;
      mrtK += seat.planeWeights[d]! * (fs > 0 ? Math.sqrt(Math.sqrt(sum / fs)) : 0);
    }
    const i = this.input;
    i.ta = seat.pmv.ta;
    i.tr = mrtK - 273.15;
    i.vr = seat.pmv.vr;
    i.rh = seat.pmv.rh;
    i.met = seat.pmv.met;
    i.clo = seat.pmv.clo;
    this.evaluations += 1;
    return pmvPpd(i, this.result).pmv;
  }

  pmvAt(seat: Readonly<ProblemSeat>, choice: ArrayLike<number>): number {
    return this.pmvWith(seat, (k) => {
      const link = seat.links[k]!;
      return link.t4[choice[link.panel]!]!;
    });
  }
}

/** One room's search state: the choice per problem panel, and per seat its PMV and violation. */
interface RoomState {
  panelIdx: number[];
  seatIdx: number[];
  /** Seats (indices into seatIdx) each panel affects. */
  seatsOfPanel: Map<number, number[]>;
  choice: Int32Array;
  pmv: Float64Array;
  violation: Float64Array;
}

function totalOutput(problem: Readonly<LouverProblem>, panelIdx: ReadonlyArray<number>, choice: ArrayLike<number>): number {
  let o = 0;
  for (const j of panelIdx) o += problem.panels[j]!.outputW[choice[j]!]!;
  return o;
}

function sum(xs: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < xs.length; i++) s += xs[i]!;
  return s;
}

/** Index of the lowest-output candidate of a panel (first on ties). */
function lowestOutput(panel: Readonly<ProblemPanel>): number {
  let best = 0;
  for (let c = 1; c < panel.outputW.length; c++) if (panel.outputW[c]! < panel.outputW[best]! - OUTPUT_EPS_W) best = c;
  return best;
}

function exhaustive(problem: Readonly<LouverProblem>, s: RoomState, ev: SeatEvaluator): void {
  const P = s.panelIdx.length;
  const choice = s.choice;
  const counters = new Int32Array(P);
  for (let p = 0; p < P; p++) choice[s.panelIdx[p]!] = 0;
  let bestV = Infinity;
  let bestO = Infinity;
  const best = Int32Array.from(choice);
  for (;;) {
    const o = totalOutput(problem, s.panelIdx, choice);
    if (!(bestV <= VIOLATION_EPS && o >= bestO - OUTPUT_EPS_W)) {
      let v = 0;
      for (const si of s.seatIdx) {
        const seat = problem.seats[si]!;
        v += pmvViolation(ev.pmvAt(seat, choice), seat.constraints);
        if (bestV <= VIOLATION_EPS && v > VIOLATION_EPS) break; // a feasible setting is already known
      }
      if (v < bestV - VIOLATION_EPS || (Math.abs(v - bestV) <= VIOLATION_EPS && o < bestO - OUTPUT_EPS_W)) {
        bestV = v;
        bestO = o;
        best.set(choice);
      }
    }
    // Odometer step.
    let p = 0;
    while (p < P) {
      const j = s.panelIdx[p]!;
      counters[p] = counters[p]! + 1;
      if (counters[p]! < problem.panels[j]!.anglesDeg.length) {
        choice[j] = counters[p]!;
        break;
      }
      counters[p] = 0;
      choice[j] = 0;
      p += 1;
    }
    if (p === P) break;
  }
  choice.set(best);
}

/** Seats' PMV and violation after moving the given panels; returns the new total violation. */
function trial(
  problem: Readonly<LouverProblem>,
  s: RoomState,
  ev: SeatEvaluator,
  moves: ReadonlyArray<readonly [number, number]>,
  outPmv: Float64Array,
  outViolation: Float64Array,
): number {
  const saved = moves.map(([j]) => s.choice[j]!);
  for (const [j, c] of moves) s.choice[j] = c;
  outPmv.set(s.pmv);
  outViolation.set(s.violation);
  const touched = new Set<number>();
  for (const [j] of moves) for (const k of s.seatsOfPanel.get(j) ?? []) touched.add(k);
  for (const k of [...touched].sort((a, b) => a - b)) {
    const seat = problem.seats[s.seatIdx[k]!]!;
    const pmv = ev.pmvAt(seat, s.choice);
    outPmv[k] = pmv;
    outViolation[k] = pmvViolation(pmv, seat.constraints);
  }
  moves.forEach(([j], m) => (s.choice[j] = saved[m]!));
  return sum(outViolation);
}

/**
 * Candidate moves from the current choice: single panels to any other candidate — or, in a
 * room with more than {@link ALL_SINGLE_MOVES_LIMIT} candidates in all, to candidates ±1, ±2,
 * ±4, … grid steps away and the two ends (fewer evaluations per step, a few more steps) — and,
 * with `pairs`, every change of two panels at once.
 */
function moveSets(problem: Readonly<LouverProblem>, s: RoomState, pairs: boolean): (readonly [number, number])[][] {
  const sets: (readonly [number, number])[][] = [];
  let candidates = 0;
  for (const j of s.panelIdx) candidates += problem.panels[j]!.anglesDeg.length;
  const all = candidates <= ALL_SINGLE_MOVES_LIMIT;
  for (const j of s.panelIdx) {
    const n = problem.panels[j]!.anglesDeg.length;
    const cur = s.choice[j]!;
    if (all) {
      for (let c = 0; c < n; c++) if (c !== cur) sets.push([[j, c]]);
      continue;
    }
    const targets = new Set<number>([0, n - 1]);
    for (let step = 1; step < n; step *= 2) {
      if (cur - step >= 0) targets.add(cur - step);
      if (cur + step < n) targets.add(cur + step);
    }
    targets.delete(cur);
    for (const c of [...targets].sort((a, b) => a - b)) sets.push([[j, c]]);
  }
  if (!pairs) return sets;
  for (let a = 0; a < s.panelIdx.length; a++) {
    for (let b = a + 1; b < s.panelIdx.length; b++) {
      const i = s.panelIdx[a]!;
      const j = s.panelIdx[b]!;
      for (let ci = 0; ci < problem.panels[i]!.anglesDeg.length; ci++) {
        if (ci === s.choice[i]) continue;
        for (let cj = 0; cj < problem.panels[j]!.anglesDeg.length; cj++) {
          if (cj !== s.choice[j]) sets.push([[i, ci], [j, cj]]);
        }
      }
    }
  }
  return sets;
}

function heuristic(problem: Readonly<LouverProblem>, s: RoomState, ev: SeatEvaluator): void {
  const n = s.seatIdx.length;
  const pmvScratch = new Float64Array(n);
  const violationScratch = new Float64Array(n);
  const bestPmv = new Float64Array(n);
  const bestViolation = new Float64Array(n);
  let pairWork = 0;
  for (let a = 0; a < s.panelIdx.length; a++) {
    for (let b = a + 1; b < s.panelIdx.length; b++) {
      pairWork += problem.panels[s.panelIdx[a]!]!.anglesDeg.length * problem.panels[s.panelIdx[b]!]!.anglesDeg.length;
    }
  }
  const pairsAllowed = pairWork <= PAIR_MOVE_LIMIT;
  const outputOf = (j: number, c: number) => problem.panels[j]!.outputW[c]!;
  const apply = (moves: ReadonlyArray<readonly [number, number]>) => {
    for (const [j, c] of moves) s.choice[j] = c;
    s.pmv.set(bestPmv);
    s.violation.set(bestViolation);
  };

  for (const j of s.panelIdx) s.choice[j] = lowestOutput(problem.panels[j]!);
  evaluateAll(problem, s, ev);

  // Greedy: largest violation drop per watt added.
  for (let guard = 0; guard < 10_000; guard++) {
    const v = sum(s.violation);
    if (v <= VIOLATION_EPS) break;
    let found = false;
    for (const withPairs of pairsAllowed ? [false, true] : [false]) {
      let bestScore = -Infinity;
      let bestDrop = 0;
      let bestMoves: (readonly [number, number])[] | null = null;
      for (const moves of moveSets(problem, s, withPairs)) {
        if (withPairs && moves.length === 1) continue;
        const v2 = trial(problem, s, ev, moves, pmvScratch, violationScratch);
        const drop = v - v2;
        if (drop <= VIOLATION_EPS) continue;
        let dO = 0;
        for (const [j, c] of moves) dO += outputOf(j, c) - outputOf(j, s.choice[j]!);
        const score = dO <= OUTPUT_EPS_W ? Infinity : drop / dO;
        if (score > bestScore || (score === bestScore && drop > bestDrop + VIOLATION_EPS)) {
          bestScore = score;
          bestDrop = drop;
          bestMoves = moves;
          bestPmv.set(pmvScratch);
          bestViolation.set(violationScratch);
        }
      }
      if (bestMoves) {
        apply(bestMoves);
        found = true;
        break;
      }
    }
    if (!found) break;
  }

  // Descent: lower the output without raising the violation, to a fixed point.
  for (let guard = 0; guard < 100_000; guard++) {
    const v = sum(s.violation);
    let moved = false;
    for (const j of s.panelIdx) {
      const panel = problem.panels[j]!;
      const order = panel.outputW.map((o, c) => ({ o, c })).sort((a, b) => a.o - b.o || a.c - b.c);
      for (const { o, c } of order) {
        if (o >= outputOf(j, s.choice[j]!) - OUTPUT_EPS_W) break;
        const v2 = trial(problem, s, ev, [[j, c]], pmvScratch, violationScratch);
        if (v2 <= v + VIOLATION_EPS && (v > VIOLATION_EPS || v2 <= VIOLATION_EPS)) {
          bestPmv.set(pmvScratch);
          bestViolation.set(violationScratch);
          apply([[j, c]]);
          moved = true;
          break;
        }
      }
    }
    if (moved) continue;
    if (!pairsAllowed) break;
    let bestSaving = OUTPUT_EPS_W;
    let bestMoves: (readonly [number, number])[] | null = null;
    for (const moves of moveSets(problem, s, true)) {
      if (moves.length === 1) continue;
      let dO = 0;
      for (const [j, c] of moves) dO += outputOf(j, c) - outputOf(j, s.choice[j]!);
      if (-dO <= bestSaving) continue;
      const v2 = trial(problem, s, ev, moves, pmvScratch, violationScratch);
      if (v2 <= v + VIOLATION_EPS && (v > VIOLATION_EPS || v2 <= VIOLATION_EPS)) {
        bestSaving = -dO;
        bestMoves = moves;
        bestPmv.set(pmvScratch);
        bestViolation.set(violationScratch);
      }
    }
    if (!bestMoves) break;
    apply(bestMoves);
  }
}

function evaluateAll(problem: Readonly<LouverProblem>, s: RoomState, ev: SeatEvaluator): void {
  s.seatIdx.forEach((si, k) => {
    const seat = problem.seats[si]!;
    s.pmv[k] = ev.pmvAt(seat, s.choice);
    s.violation[k] = pmvViolation(s.pmv[k]!, seat.constraints);
  });
}

function fmt(x: number): string {
  return (x >= 0 ? "+" : "−") + Math.abs(x).toFixed(2);
}

/** Why a seat is outside its target after the search. */
function unreachableReason(problem: Readonly<LouverProblem>, seat: Readonly<ProblemSeat>, method: RoomSearch["method"], ev: SeatEvaluator): UnreachableSeat {
  if (seat.links.length === 0) {
    return { seatId: seat.id, code: "no_louvered_panel", reason: "No louvered panel that runs in this scenario is in its room (or visible from the seat); the louvers cannot change its comfort." };
  }
  let lo = -Infinity;
  let hi = Infinity;
  for (const c of seat.constraints) {
    lo = Math.max(lo, c.lo);
    hi = Math.min(hi, c.hi);
  }
  if (lo > hi || (lo === hi && seat.constraints.some((c) => c.strict))) {
    return { seatId: seat.id, code: "targets_conflict", reason: `Its zones' targets do not overlap (they need PMV ≥ ${fmt(lo)} and ≤ ${fmt(hi)} at once).` };
  }
  // The seat's PMV rises with each linked panel's effective T⁴, so the extremes pick each panel's extreme candidate.
  const pick = (k: number, warm: boolean) => {
    const t4 = seat.links[k]!.t4;
    return warm ? Math.max(...t4) : Math.min(...t4);
  };
  const warmest = ev.pmvWith(seat, (k) => pick(k, true));
  const coolest = ev.pmvWith(seat, (k) => pick(k, false));
  const modes = new Set(seat.links.map((l) => problem.panels[l.panel]!.mode));
  if (warmest < lo || (warmest <= lo && seat.constraints.some((c) => c.strict && c.lo === lo))) {
    return modes.has("heating")
      ? { seatId: seat.id, code: "needs_more_output", reason: `Needs more output than the panels give fully open: PMV reaches at most ${fmt(warmest)}, the target needs ${fmt(lo)} or more.` }
      : { seatId: seat.id, code: "too_cool_at_lowest_output", reason: `Too cool even with every louvered cooling panel at its lowest output: PMV reaches at most ${fmt(warmest)}, the target needs ${fmt(lo)} or more.` };
  }
  if (coolest > hi || (coolest >= hi && seat.constraints.some((c) => c.strict && c.hi === hi))) {
    return modes.has("cooling")
      ? { seatId: seat.id, code: "needs_more_cooling", reason: `Needs more cooling than the panels give fully open: PMV is at least ${fmt(coolest)}, the target needs ${fmt(hi)} or less.` }
      : { seatId: seat.id, code: "too_warm_at_lowest_output", reason: `Too warm even with every louvered panel at the lowest setting its range allows: PMV is at least ${fmt(coolest)}, the target needs ${fmt(hi)} or less.` };
  }
  return {
    seatId: seat.id,
    code: "conflicts_with_other_seats",
    reason:
      method === "exhaustive"
        ? "It can be brought inside on its own, but no louver setting keeps it inside together with the other seats of its room."
        : "It can be brought inside on its own, but the search (heuristic for this room's many setting combinations) found no setting that keeps it inside together with the other seats of its room.",
  };
}

/**
 * Chooses the louver settings for a problem (method in this file's header).
 * @param problem from buildLouverProblem (not mutated).
 * @param options method and exhaustive limit.
 * @param reportProgress optional progress callback: one unit per room.
 * @returns chosen angles and outputs, before/after PMV per target seat, unreachable seats with reasons.
 * @throws RangeError for a malformed problem (a panel without candidates).
 */
export function solveLouverProblem(problem: Readonly<LouverProblem>, options: SearchOptions = {}, reportProgress?: ReportProgress): LouverOptimisation {
  const method = options.method ?? "auto";
  const limit = options.exhaustiveLimit ?? EXHAUSTIVE_LIMIT;
  for (const p of problem.panels) {
    if (p.anglesDeg.length === 0 || p.outputW.length !== p.anglesDeg.length) throw new RangeError(`panel ${p.id} has no candidate angles`);
  }
  const ev = new SeatEvaluator();
  const choice = new Int32Array(problem.panels.length);
  const rooms: RoomSearch[] = [];
  const total = problem.rooms.length;
  reportProgress?.({ done: 0, total, stage: "Choosing louver settings room by room" });
  problem.rooms.forEach((room, r) => {
    const s: RoomState = {
      panelIdx: room.panels,
      seatIdx: room.seats,
      seatsOfPanel: new Map(room.panels.map((j) => [j, [] as number[]])),
      choice,
      pmv: new Float64Array(room.seats.length),
      violation: new Float64Array(room.seats.length),
    };
    room.seats.forEach((si, k) => {
      for (const link of problem.seats[si]!.links) s.seatsOfPanel.get(link.panel)?.push(k);
    });
    let combinations = 1;
    for (const j of room.panels) combinations *= problem.panels[j]!.anglesDeg.length;
    const before = ev.evaluations;
    let used: RoomSearch["method"] = "none";
    if (room.panels.length > 0 && room.seats.length > 0) {
      used = method === "heuristic" || (method === "auto" && combinations > limit) ? "heuristic" : "exhaustive";
      if (used === "exhaustive") exhaustive(problem, s, ev);
      else heuristic(problem, s, ev);
    } else {
      // Nobody to satisfy: the least output.
      for (const j of room.panels) choice[j] = lowestOutput(problem.panels[j]!);
    }
    rooms.push({ roomId: room.id, method: used, combinations: room.panels.length > 0 ? combinations : 0, evaluations: ev.evaluations - before });
    const name = room.name.length > 60 ? `${room.name.slice(0, 59)}…` : room.name;
    reportProgress?.({ done: r + 1, total, stage: `Room "${name}" done` });
  });

  const panels: OptimisedPanel[] = problem.panels.map((p, j) => ({
    id: p.id,
    label: p.label,
    roomId: p.roomId,
    mode: p.mode,
    openingAngleDeg: p.anglesDeg[choice[j]!]!,
    outputW: round(p.outputW[choice[j]!]!, 2),
    previousAngleDeg: p.currentAngleDeg,
    previousOutputW: round(p.currentOutputW, 2),
    minAngleDeg: p.minAngleDeg,
    maxAngleDeg: p.maxAngleDeg,
  }));
  const methodOfRoom = new Map(rooms.map((r) => [r.roomId, r.method]));
  const unreachable: UnreachableSeat[] = [];
  const seats: OptimisedSeat[] = problem.seats.map((seat) => {
    const pmvBefore = ev.pmvWith(seat, (k) => seat.links[k]!.currentT4);
    const pmvAfter = ev.pmvAt(seat, choice);
    const inTarget = pmvViolation(pmvAfter, seat.constraints) === 0;
    if (!inTarget) unreachable.push(unreachableReason(problem, seat, methodOfRoom.get(seat.roomId) ?? "none", ev));
    return {
      id: seat.id,
      label: seat.label,
      roomId: seat.roomId,
      zoneIds: seat.zoneIds,
      pmvBefore: round(pmvBefore, 3),
      pmvAfter: round(pmvAfter, 3),
      inTargetBefore: pmvViolation(pmvBefore, seat.constraints) === 0,
      inTarget,
    };
  });
  return {
    panels,
    seats,
    unreachable,
    totalOutputW: round(problem.panels.reduce((acc, p, j) => acc + p.outputW[choice[j]!]!, 0), 2),
    totalOutputBeforeW: round(problem.panels.reduce((acc, p) => acc + p.currentOutputW, 0), 2),
    rooms,
  };
}
