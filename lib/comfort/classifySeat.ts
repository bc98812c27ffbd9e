/**
 * Comfort category of a seat (ISO 7730:2005 Annex A) and ASHRAE 55 compliance.
 */
import { assertFinite, assertNonNegative } from "./assert";
import { floorTemperatureDissatisfied } from "./floorTemperature";
import { radiantAsymmetryDissatisfied, type RadiantAsymmetryKind } from "./radiantAsymmetry";
import { verticalAirTemperatureDifferenceDissatisfied } from "./verticalAirTemperature";
import { ppdFromPmv } from "./ppd";

/** ISO 7730:2005 Annex A category of the thermal environment. */
export type ComfortCategory = "A" | "B" | "C";

/** One radiant temperature asymmetry seen from the seat. */
export interface RadiantAsymmetryEntry {
  /** Kind of asymmetry. */
  kind: RadiantAsymmetryKind;
  /** Radiant temperature asymmetry Δt_pr, °C (K), ≥ 0. */
  deltaC: number;
}

/** Per-seat results to classify; the optional local-discomfort values are checked only when given. */
export interface SeatComfortResults {
  /** Predicted mean vote, dimensionless. */
  pmv: number;
  /** Predicted percentage of dissatisfied, %. */
  ppd: number;
  /** Draught rate DR, %, ≥ 0 (ISO 7730:2005 eq. (6)). */
  draughtRate?: number;
  /** Radiant temperature asymmetries, one entry per kind of interest. */
  radiantAsymmetry?: ReadonlyArray<Readonly<RadiantAsymmetryEntry>>;
  /** Floor surface temperature, °C. */
  floorC?: number;
  /** Head-minus-ankle air temperature difference, °C. */
  verticalAirDeltaC?: number;
  /** Posture for the ASHRAE 55 vertical limit; default "seated". */
  posture?: "seated" | "standing";
}

/** Machine-readable code of a comfort limit. */
export type ComfortLimitCode =
  | "ISO7730_PPD"
  | "ISO7730_PMV"
  | "ISO7730_DRAUGHT_RATE"
  | "ISO7730_VERTICAL_AIR_TEMPERATURE"
  | "ISO7730_FLOOR_TEMPERATURE"
  | "ISO7730_RADIANT_ASYMMETRY"
  | "ASHRAE55_PMV"
  | "ASHRAE55_VERTICAL_AIR_TEMPERATURE"
  | "ASHRAE55_FLOOR_TEMPERATURE"
  | "ASHRAE55_RADIANT_ASYMMETRY";

/** A failed limit: what was compared, the allowed interval and a human message. */
export interface ComfortLimitFailure {
  /** Machine-readable code. */
  code: ComfortLimitCode;
  /** Human-readable explanation (English). */
  message: string;
  /** Compared value: PPD/DR/PD in %, PMV dimensionless, temperatures/differences in °C. */
  value: number;
  /** Lower end of the allowed interval (same unit as value), or null if unbounded. */
  allowedMin: number | null;
  /** Upper end of the allowed interval (same unit as value), or null if unbounded. */
  allowedMax: number | null;
  /** Asymmetry kind, for the radiant-asymmetry codes. */
  kind?: RadiantAsymmetryKind;
}

/** Result of {@link classifySeat}. */
export interface SeatClassification {
  /** Best ISO 7730:2005 Annex A category met, or null when even C fails. */
  category: ComfortCategory | null;
  /** The category one better than `category` (A for null → C), or null when `category` is A. */
  nextBetterCategory: ComfortCategory | null;
  /** Limits of `nextBetterCategory` that fail (empty when `category` is A). */
  failuresForNextBetterCategory: ComfortLimitFailure[];
  /** Percentages dissatisfied derived from the local values, %, null when not given. */
  percentDissatisfied: {
    verticalAirTemperature: number | null;
    floorTemperature: number | null;
    /** Highest PD over the given asymmetries. */
    radiantAsymmetry: number | null;
  };
  /** ASHRAE 55 compliance of the given values. */
  ashrae55: {
    compliant: boolean;
    failures: ComfortLimitFailure[];
  };
}

/** ISO 7730:2005 Table A.1 limits of one category [1]. */
interface CategoryLimits {
  ppd: number;
  pmvAbs: number;
  draughtRate: number;
  verticalPd: number;
  floorPd: number;
  radiantPd: number;
}

/**
 * ISO 7730:2005 Annex A, Table A.1 [1] (from memory, consistent with public transcriptions):
 * all limits are strict ("<"), PMV as −x < PMV < +x.
 */
export const ISO7730_CATEGORY_LIMITS: Readonly<Record<ComfortCategory, Readonly<CategoryLimits>>> = {
  A: { ppd: 6, pmvAbs: 0.2, draughtRate: 10, verticalPd: 3, floorPd: 10, radiantPd: 5 },
  B: { ppd: 10, pmvAbs: 0.5, draughtRate: 20, verticalPd: 5, floorPd: 10, radiantPd: 5 },
  C: { ppd: 15, pmvAbs: 0.7, draughtRate: 30, verticalPd: 10, floorPd: 15, radiantPd: 10 },
};

/**
 * ASHRAE 55 limits (ASHRAE 55-2017 clause 5.3 and its local-discomfort tables) [3], from
 * memory: PMV −0.5 < PMV < +0.5; radiant asymmetry warm ceiling < 5 °C, cool wall < 10 °C,
 * cool ceiling < 14 °C, warm wall < 23 °C; floor 19…29 °C; vertical air temperature
 * difference < 3 °C seated (0.1–1.1 m) and < 4 °C standing (0.1–1.7 m; the standing value
 * is not confirmed from a document).
 */
export const ASHRAE55_LIMITS = {
  pmvAbs: 0.5,
  radiantAsymmetryMaxC: { warmCeiling: 5, coolWall: 10, coolCeiling: 14, warmWall: 23 } as Readonly<
    Record<RadiantAsymmetryKind, number>
  >,
  floorMinC: 19,
  floorMaxC: 29,
  verticalSeatedMaxC: 3,
  verticalStandingMaxC: 4,
} as const;

const KIND_LABEL: Readonly<Record<RadiantAsymmetryKind, string>> = {
  warmCeiling: "warm ceiling",
  coolWall: "cool wall",
  coolCeiling: "cool ceiling",
  warmWall: "warm wall",
};

function fmt(x: number): string {
  return Number.isInteger(x) ? String(x) : x.toFixed(2);
}

/** Failures of one category's Table A.1 limits (empty when all are met). */
function isoFailures(
  cat: ComfortCategory,
  r: Readonly<SeatComfortResults>,
  verticalPd: number | null,
  floorPd: number | null,
  radiantPd: ReadonlyArray<{ kind: RadiantAsymmetryKind; pd: number }>,
): ComfortLimitFailure[] {
  const l = ISO7730_CATEGORY_LIMITS[cat];
  const out: ComfortLimitFailure[] = [];
  // Table A.1's PPD column is eq. (5) at the PMV band edge, rounded to whole per cent; the
  // unrounded edge value keeps the PPD and PMV criteria consistent for a PPD derived from PMV.
  const ppdLimit = ppdFromPmv(l.pmvAbs);
  if (!(r.ppd < ppdLimit)) {
    out.push({
      code: "ISO7730_PPD",
      message: `PPD ${fmt(r.ppd)} % is not below ${ppdLimit.toFixed(1)} % (ISO 7730 category ${cat}, table value ${l.ppd} %)`,
      value: r.ppd,
      allowedMin: null,
      allowedMax: ppdLimit,
    });
  }
  if (!(r.pmv > -l.pmvAbs && r.pmv < l.pmvAbs)) {
    out.push({
      code: "ISO7730_PMV",
      message: `PMV ${fmt(r.pmv)} is not within −${l.pmvAbs} < PMV < +${l.pmvAbs} (ISO 7730 category ${cat})`,
      value: r.pmv,
      allowedMin: -l.pmvAbs,
      allowedMax: l.pmvAbs,
    });
  }
  if (r.draughtRate !== undefined && !(r.draughtRate < l.draughtRate)) {
    out.push({
      code: "ISO7730_DRAUGHT_RATE",
      message: `draught rate ${fmt(r.draughtRate)} % is not below ${l.draughtRate} % (ISO 7730 category ${cat})`,
      value: r.draughtRate,
      allowedMin: null,
      allowedMax: l.draughtRate,
    });
  }
  if (verticalPd !== null && !(verticalPd < l.verticalPd)) {
    out.push({
      code: "ISO7730_VERTICAL_AIR_TEMPERATURE",
      message: `${fmt(verticalPd)} % dissatisfied with the vertical air temperature difference, not below ${l.verticalPd} % (ISO 7730 category ${cat})`,
      value: verticalPd,
      allowedMin: null,
      allowedMax: l.verticalPd,
    });
  }
  if (floorPd !== null && !(floorPd < l.floorPd)) {
    out.push({
      code: "ISO7730_FLOOR_TEMPERATURE",
      message: `${fmt(floorPd)} % dissatisfied with the floor temperature, not below ${l.floorPd} % (ISO 7730 category ${cat})`,
      value: floorPd,
      allowedMin: null,
      allowedMax: l.floorPd,
    });
  }
  for (const { kind, pd } of radiantPd) {
    if (!(pd < l.radiantPd)) {
      out.push({
        code: "ISO7730_RADIANT_ASYMMETRY",
        message: `${fmt(pd)} % dissatisfied with the ${KIND_LABEL[kind]} radiant asymmetry, not below ${l.radiantPd} % (ISO 7730 category ${cat})`,
        value: pd,
        allowedMin: null,
        allowedMax: l.radiantPd,
        kind,
      });
    }
  }
  return out;
}

function ashraeFailures(r: Readonly<SeatComfortResults>): ComfortLimitFailure[] {
  const out: ComfortLimitFailure[] = [];
  const lim = ASHRAE55_LIMITS;
  if (!(r.pmv > -lim.pmvAbs && r.pmv < lim.pmvAbs)) {
    out.push({
      code: "ASHRAE55_PMV",
      message: `PMV ${fmt(r.pmv)} is not within −0.5 < PMV < +0.5 (ASHRAE 55)`,
      value: r.pmv,
      allowedMin: -lim.pmvAbs,
      allowedMax: lim.pmvAbs,
    });
  }
  for (const a of r.radiantAsymmetry ?? []) {
    const max = lim.radiantAsymmetryMaxC[a.kind];
    if (!(a.deltaC < max)) {
      out.push({
        code: "ASHRAE55_RADIANT_ASYMMETRY",
        message: `${KIND_LABEL[a.kind]} radiant asymmetry ${fmt(a.deltaC)} °C is not below ${max} °C (ASHRAE 55)`,
        value: a.deltaC,
        allowedMin: null,
        allowedMax: max,
        kind: a.kind,
      });
    }
  }
  if (r.floorC !== undefined && !(r.floorC >= lim.floorMinC && r.floorC <= lim.floorMaxC)) {
    out.push({
      code: "ASHRAE55_FLOOR_TEMPERATURE",
      message: `floor temperature ${fmt(r.floorC)} °C is outside 19…29 °C (ASHRAE 55)`,
      value: r.floorC,
      allowedMin: lim.floorMinC,
      allowedMax: lim.floorMaxC,
    });
  }
  if (r.verticalAirDeltaC !== undefined) {
    const standing = r.posture === "standing";
    const max = standing ? lim.verticalStandingMaxC : lim.verticalSeatedMaxC;
    if (!(r.verticalAirDeltaC < max)) {
      out.push({
        code: "ASHRAE55_VERTICAL_AIR_TEMPERATURE",
        message: `vertical air temperature difference ${fmt(r.verticalAirDeltaC)} °C is not below ${max} °C for a ${standing ? "standing" : "seated"} occupant (ASHRAE 55)`,
        value: r.verticalAirDeltaC,
        allowedMin: null,
        allowedMax: max,
      });
    }
  }
  return out;
}

/**
 * Classifies a seat: the best ISO 7730:2005 Annex A category whose Table A.1 limits are
 * all met [1] (PPD, PMV band, draught rate, and the percentages dissatisfied from the
 * vertical air temperature difference (eq. (7)), the floor temperature (eq. (8)) and the
 * radiant asymmetries (clause 6.5)), the limits that fail the next better category, and
 * compliance with the ASHRAE 55 limits [3] (see {@link ASHRAE55_LIMITS}). Local values that
 * are not given are not checked. Draught is not part of the ASHRAE check here (ASHRAE
 * 55-2017 replaced the draught rate by an ankle-draught model).
 *
 * Table A.1's PPD limits (6, 10, 15 %) are eq. (5) evaluated at the PMV band edges and rounded
 * to whole per cent (PPD(±0.2) = 5.8 %, PPD(±0.5) = 10.2 %, PPD(±0.7) = 15.3 %). Applying the
 * rounded values literally would narrow the PMV bands (PMV 0.49 would fail B), so the PPD
 * criterion uses the unrounded edge values: for a PPD derived from the PMV it agrees with the
 * PMV band, and a PPD given independently is still checked. The radiant
 * asymmetry, floor and vertical checks likewise use the PD limits of Table A.1, not the
 * temperature limits of Tables A.3–A.5, which differ slightly from them.
 *
 * @param results pmv (finite), ppd % (finite), and optionally draughtRate % (≥ 0),
 *                radiantAsymmetry (deltaC °C ≥ 0), floorC °C, verticalAirDeltaC °C (finite), posture.
 * @returns category, failing limits for the next better category, PDs and ASHRAE 55 result.
 * @throws RangeError for non-finite values, a negative draught rate or a negative asymmetry.
 */
export function classifySeat(results: Readonly<SeatComfortResults>): SeatClassification {
  assertFinite(results.pmv, "pmv");
  assertFinite(results.ppd, "ppd");
  if (results.draughtRate !== undefined) {
    assertNonNegative(results.draughtRate, "draughtRate");
  }
  const verticalPd =
    results.verticalAirDeltaC === undefined
      ? null
      : verticalAirTemperatureDifferenceDissatisfied(results.verticalAirDeltaC);
  const floorPd = results.floorC === undefined ? null : floorTemperatureDissatisfied(results.floorC);
  const radiantPd = (results.radiantAsymmetry ?? []).map((a) => ({
    kind: a.kind,
    pd: radiantAsymmetryDissatisfied(a.kind, a.deltaC),
  }));

  let category: ComfortCategory | null = null;
  let failures: ComfortLimitFailure[] = [];
  // Check C, then B, then A; stop at the first category that fails.
  const order: ComfortCategory[] = ["C", "B", "A"];
  for (const cat of order) {
    const f = isoFailures(cat, results, verticalPd, floorPd, radiantPd);
    if (f.length > 0) {
      failures = f;
      break;
    }
    category = cat;
  }
  const nextBetterCategory: ComfortCategory | null =
    category === null ? "C" : category === "C" ? "B" : category === "B" ? "A" : null;

  const ashrae = ashraeFailures(results);
  let radiantMax: number | null = null;
  for (const { pd } of radiantPd) {
    radiantMax = radiantMax === null || pd > radiantMax ? pd : radiantMax;
  }
  return {
    category,
    nextBetterCategory,
    failuresForNextBetterCategory: category === "A" ? [] : failures,
    percentDissatisfied: {
      verticalAirTemperature: verticalPd,
      floorTemperature: floorPd,
      radiantAsymmetry: radiantMax,
    },
    ashrae55: { compliant: ashrae.length === 0, failures: ashrae },
  };
}
