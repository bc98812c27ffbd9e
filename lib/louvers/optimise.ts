/**
 * Automatic louver settings (pure, deterministic, no I/O): for a layout under a scenario,
 * each active louvered panel's opening angle within its allowed range such that every target
 * seat is inside its zones' PMV targets with the least total panel output — or the seats that
 * cannot be brought inside, each with a reason.
 *
 * Two steps, split so the expensive one can run in a worker thread without plan geometry:
 * {@link buildLouverProblem} (optimise-problem.ts) precomputes everything that does not depend
 * on the angles; {@link solveLouverProblem} (optimise-search.ts) searches the angle grid.
 *
 * Target seats: `seatIds` when given (the service passes the seats with an occupant assigned,
 * when any are), otherwise every seat inside at least one zone; a seat in several zones must
 * meet all their targets. Zone targets: a PMV band (min ≤ PMV ≤ max) or an ISO 7730 category
 * (|PMV| below the category's limit from the seat classifier, ISO 7730 Table A.1 [1]). Only PMV
 * is optimised; the category's other limits (asymmetry, draught, floor) are not louver
 * decisions.
 *
 * References [n]: lib/louvers/REFERENCES.md.
 *
 * Invalid input: the layout must pass validateForCompute (AppError 'invalid_input' naming the
 * objects otherwise); a malformed problem is a RangeError.
 */
import type { Layout } from "@/lib/layout/schema";
import type { ReportProgress } from "@/lib/workers/progress";
import type { ScenarioConditions } from "@/lib/scenarios/schema";
import { buildLouverProblem, type LouverProblemOptions } from "./optimise-problem";
import { solveLouverProblem, type LouverOptimisation, type SearchOptions } from "./optimise-search";

export { buildLouverProblem, targetConstraint } from "./optimise-problem";
export type { LouverProblem, LouverProblemOptions, PmvConstraint, ProblemLink, ProblemPanel, ProblemRoom, ProblemSeat } from "./optimise-problem";
export { EXHAUSTIVE_LIMIT, PAIR_MOVE_LIMIT, pmvViolation, solveLouverProblem } from "./optimise-search";
export type {
  LouverOptimisation, OptimisedPanel, OptimisedSeat, RoomSearch, SearchMethod, SearchOptions, UnreachableCode, UnreachableSeat,
} from "./optimise-search";

/**
 * Chooses louver settings for a layout under a scenario (see this file's header).
 * @param layout a schema-valid layout.
 * @param conditions the scenario's design conditions.
 * @param options cavity tables, target seats, search method ("auto" | "exhaustive" | "heuristic").
 * @param reportProgress optional, one unit per room.
 * @returns the chosen angles (each within its panel's allowed range), outputs (W), before/after PMV and unreachable seats.
 * @throws AppError('invalid_input') when the layout cannot be computed.
 */
export function optimiseLouvers(
  layout: Layout,
  conditions: ScenarioConditions,
  options: LouverProblemOptions & SearchOptions = {},
  reportProgress?: ReportProgress,
): LouverOptimisation {
  return solveLouverProblem(buildLouverProblem(layout, conditions, options), options, reportProgress);
}
