/**
 * Coverage of a room load by the output of its panels.
 */
import { assertFinite } from "./assert";

/** Input of {@link loadCoverage}. */
export interface LoadCoverageInput {
  /** Room load to cover (design heat loss or sensible cooling load), W, finite. */
  loadW: number;
  /** Output of each panel in the room in the same mode, W, finite (may be empty). */
  panelOutputsW: ReadonlyArray<number>;
}

/** Result of {@link loadCoverage}. */
export interface LoadCoverage {
  /** Σ panel outputs, W. */
  totalOutputW: number;
  /** Σ outputs / load × 100, %; NaN when there is no load (loadW ≤ 0). */
  coveragePercent: number;
  /** max(0, load − Σ outputs), W. */
  shortfallW: number;
  /** True when the coverage is below 100 % (false when there is no load). */
  warning: boolean;
  /** True when loadW ≤ 0: nothing to cover. */
  noLoad: boolean;
}

/**
 * Coverage of a room load by its panels: coverage = Σ Q_panel / Φ_load × 100 % and the
 * shortfall max(0, Φ_load − Σ Q_panel) — the sizing check of EN 12831 / EN 1264 design
 * practice (installed output ≥ design load; common practice).
 *
 * @param input loadW W (finite), panelOutputsW W (finite each; an empty list is 0 W).
 * @returns total output W, coverage %, shortfall W, warning below 100 %, noLoad flag.
 * @throws RangeError for a non-finite load or output.
 */
export function loadCoverage(input: Readonly<LoadCoverageInput>): LoadCoverage {
  assertFinite(input.loadW, "loadW");
  let total = 0;
  for (let i = 0; i < input.panelOutputsW.length; i++) {
    const q = input.panelOutputsW[i] as number;
    assertFinite(q, `panelOutputsW[${i}]`);
    total += q;
  }
  if (input.loadW <= 0) {
    return { totalOutputW: total, coveragePercent: Number.NaN, shortfallW: 0, warning: false, noLoad: true };
  }
  const coveragePercent = (total / input.loadW) * 100;
  return {
    totalOutputW: total,
    coveragePercent,
    shortfallW: Math.max(0, input.loadW - total),
    warning: total < input.loadW,
    noLoad: false,
  };
}
