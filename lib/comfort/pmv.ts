/**
 * Predicted mean vote (PMV) and predicted percentage of dissatisfied (PPD), ISO 7730:2005 clause 4.
 */
import { assertFinite, assertInClosedRange, assertNonNegative } from "./assert";
import { CLO_M2K_W, ISO7730_KELVIN_OFFSET_K, MET_W_M2 } from "./constants";

/** Inputs of the PMV model (ISO 7730:2005 clause 4.1) [1]. */
export interface PmvInput {
  /** Air temperature t_a, °C. */
  ta: number;
  /** Mean radiant temperature t̄_r, °C. */
  tr: number;
  /** Relative air velocity v_ar, m/s, ≥ 0. */
  vr: number;
  /** Relative humidity, %, 0…100. */
  rh: number;
  /** Metabolic rate, met (1 met = 58.15 W/m²), ≥ 0. */
  met: number;
  /** Clothing insulation, clo (1 clo = 0.155 m²K/W), ≥ 0. */
  clo: number;
  /** External work, met, ≥ 0; default 0. */
  wme?: number;
}

/** PMV/PPD result. */
export interface PmvResult {
  /** Predicted mean vote, dimensionless (ISO 7730:2005 eq. (1)). */
  pmv: number;
  /** Predicted percentage of dissatisfied, % (ISO 7730:2005 eq. (5)). */
  ppd: number;
  /** False when an input or the PMV lies outside the ISO 7730:2005 clause 4.1 applicability ranges. */
  withinRange: boolean;
}

/**
 * Applicability ranges of the PMV model, ISO 7730:2005 clause 4.1 [1]. The standard gives
 * M = 46…232 W/m² "(0.8 met to 4 met)"; the met bounds are used here.
 */
export const PMV_APPLICABILITY_ISO7730 = {
  /** Metabolic rate, met. */
  metMin: 0.8,
  metMax: 4,
  /** Clothing insulation, clo. */
  cloMin: 0,
  cloMax: 2,
  /** Air temperature, °C. */
  taMinC: 10,
  taMaxC: 30,
  /** Mean radiant temperature, °C. */
  trMinC: 10,
  trMaxC: 40,
  /** Relative air velocity, m/s. */
  vrMinMs: 0,
  vrMaxMs: 1,
  /** Partial water-vapour pressure, Pa. */
  paMinPa: 0,
  paMaxPa: 2700,
  /** PMV. */
  pmvMin: -2,
  pmvMax: 2,
} as const;

/** Radiative exchange constant of the clothed body, W/(m²K⁴): 3.96·10⁻⁸ in ISO 7730:2005 eqs. (1)–(2) [1]. */
const BODY_RADIATION_W_M2K4 = 3.96e-8;
/** Skin-side constant of eq. (2), °C: t_cl = 35.7 − 0.028·(M − W) − … [1]. */
const CLOTHING_EQ_CONSTANT_C = 35.7;
/** Convergence tolerance of the clothing surface temperature, K (Annex D stops at 0.015 K). */
const CLOTHING_TEMPERATURE_TOLERANCE_K = 1e-7;
/** Safety cap on solver iterations (the Newton solve normally needs 3–5). */
const MAX_ITERATIONS = 60;

/**
 * Throws a RangeError describing the first programmer error in a PMV input (non-finite
 * values, negative vr/met/clo/wme, rh outside 0…100 %). Does nothing for a valid input.
 * {@link pmvPpd} performs the same checks in a cheap combined form and calls this only to
 * build the message.
 *
 * @param input PMV inputs (units as in {@link PmvInput}).
 * @throws RangeError on the first invalid field.
 */
export function validatePmvInput(input: Readonly<PmvInput>): void {
  assertFinite(input.ta, "ta");
  assertFinite(input.tr, "tr");
  assertNonNegative(input.vr, "vr");
  assertInClosedRange(input.rh, "rh", 0, 100);
  assertNonNegative(input.met, "met");
  assertNonNegative(input.clo, "clo");
  if (input.wme !== undefined) {
    assertNonNegative(input.wme, "wme");
  }
}

/**
 * Clothing surface temperature, K (ISO 7730 offset 273), solving ISO 7730:2005 eqs. (2)–(4)
 * [1] exactly by a safeguarded Newton iteration on
 * F(T) = (T − 273) − (35.7 − 0.028·(M − W)) + I_cl·f_cl·[3.96·10⁻⁸(T⁴ − T_r⁴) + h_c(T)(T − T_a)],
 * h_c = max(2.38·|T − T_a|^0.25, h_cf). F is strictly increasing (F' ≥ 1), so the root is
 * unique and a sign bracket guards the steps.
 *
 * @param taK       air temperature, K (ISO 7730 offset 273), finite.
 * @param trK4      fourth power of the mean radiant temperature, K⁴ (offset 273), > 0.
 * @param iclFcl    I_cl·f_cl, m²K/W, ≥ 0.
 * @param hcf       forced-convection coefficient 12.1·√v_ar, W/(m²K), ≥ 0.
 * @param skinTermC 35.7 − 0.028·(M − W), °C, finite.
 * @returns clothing surface temperature, K (offset 273), converged to 1e-7 K.
 */
function clothingSurfaceTemperatureK(
  taK: number,
  trK4: number,
  iclFcl: number,
  hcf: number,
  skinTermC: number,
): number {
  const rhsK = skinTermC + ISO7730_KELVIN_OFFSET_K;
  // Linearised first guess: radiation coefficient at ~300 K, convection at the forced value or 3 W/m²K.
  const hr0 = 4 * BODY_RADIATION_W_M2K4 * 2.7e7;
  const hc0 = hcf > 3 ? hcf : 3;
  const trK = Math.sqrt(Math.sqrt(trK4));
  let t = (rhsK + iclFcl * (hr0 * trK + hc0 * taK)) / (1 + iclFcl * (hr0 + hc0));
  let lo = Number.NEGATIVE_INFINITY;
  let hi = Number.POSITIVE_INFINITY;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const d = t - taK;
    const hcn = 2.38 * Math.sqrt(Math.sqrt(d < 0 ? -d : d));
    let hc: number;
    let dConvection: number; // d/dT [h_c·(T − T_a)]
    if (hcf > hcn) {
      hc = hcf;
      dConvection = hcf;
    } else {
      hc = hcn;
      dConvection = 1.25 * hcn;
    }
    const t2 = t * t;
    const f = t - rhsK + iclFcl * (BODY_RADIATION_W_M2K4 * (t2 * t2 - trK4) + hc * d);
    if (f === 0) {
      return t;
    }
    if (f > 0) {
      hi = t;
    } else {
      lo = t;
    }
    const fp = 1 + iclFcl * (4 * BODY_RADIATION_W_M2K4 * t2 * t + dConvection);
    let next = t - f / fp;
    if (!(next > lo && next < hi) && lo > Number.NEGATIVE_INFINITY && hi < Number.POSITIVE_INFINITY) {
      next = 0.5 * (lo + hi);
    }
    const step = next - t;
    t = next;
    if (step < CLOTHING_TEMPERATURE_TOLERANCE_K && step > -CLOTHING_TEMPERATURE_TOLERANCE_K) {
      return t;
    }
  }
  return t;
}

/**
 * PMV and PPD, ISO 7730:2005 clause 4, equations (1)–(5), with the water-vapour pressure
 * and the sweating term as in the Annex D computer program [1]:
 *
 * - pa = RH · 10 · exp(16.6536 − 4030.183/(ta + 235)) Pa;
 * - sweat loss 0.42·(M − W − 58.15) only when M − W > 58.15 W/m² (Annex D line HL2);
 * - clothing surface temperature from eqs. (2)–(4) solved to 10⁻⁷ K (Annex D stops at 0.015 K);
 * - f_cl = 1.00 + 1.290·I_cl for I_cl ≤ 0.078 m²K/W, else 1.05 + 0.645·I_cl (eq. (4)).
 *
 * Values outside the clause 4.1 applicability ranges are still computed; `withinRange` is
 * then false. Allocation-free when `out` is given (hot loops); no validation library.
 *
 * @param input PMV inputs: ta °C (finite), tr °C (finite), vr m/s (≥ 0), rh % (0…100),
 *              met (≥ 0), clo (≥ 0), wme met (≥ 0, default 0).
 * @param out   optional result object to overwrite (avoids an allocation).
 * @returns PMV (dimensionless), PPD (%) and the applicability flag.
 * @throws RangeError for non-finite inputs, negative vr/met/clo/wme, or rh outside 0…100 %.
 */
export function pmvPpd(input: Readonly<PmvInput>, out?: PmvResult): PmvResult {
  const ta = input.ta;
  const tr = input.tr;
  const vr = input.vr;
  const rh = input.rh;
  const met = input.met;
  const clo = input.clo;
  const wme = input.wme === undefined ? 0 : input.wme;
  if (
    !(
      ta - ta === 0 &&
      tr - tr === 0 &&
      vr >= 0 &&
      vr < Number.POSITIVE_INFINITY &&
      rh >= 0 &&
      rh <= 100 &&
      met >= 0 &&
      met < Number.POSITIVE_INFINITY &&
      clo >= 0 &&
      clo < Number.POSITIVE_INFINITY &&
      wme >= 0 &&
      wme < Number.POSITIVE_INFINITY
    )
  ) {
    validatePmvInput(input);
    throw new RangeError("pmvPpd: invalid input");
  }

  const pa = rh * 10 * Math.exp(16.6536 - 4030.183 / (ta + 235));
  const icl = CLO_M2K_W * clo;
  const m = met * MET_W_M2;
  const mw = m - wme * MET_W_M2;
  const fcl = icl <= 0.078 ? 1 + 1.29 * icl : 1.05 + 0.645 * icl;
  const hcf = 12.1 * Math.sqrt(vr);
  const taK = ta + ISO7730_KELVIN_OFFSET_K;
  const trK = tr + ISO7730_KELVIN_OFFSET_K;
  const trK2 = trK * trK;
  const trK4 = trK2 * trK2;

  const tclK = clothingSurfaceTemperatureK(taK, trK4, icl * fcl, hcf, CLOTHING_EQ_CONSTANT_C - 0.028 * mw);
  const d = tclK - taK;
  const hcn = 2.38 * Math.sqrt(Math.sqrt(d < 0 ? -d : d));
  const hc = hcf > hcn ? hcf : hcn;
  const tclK2 = tclK * tclK;

  const skinDiffusion = 3.05e-3 * (5733 - 6.99 * mw - pa);
  const sweating = mw > MET_W_M2 ? 0.42 * (mw - MET_W_M2) : 0;
  const latentRespiration = 1.7e-5 * m * (5867 - pa);
  const dryRespiration = 0.0014 * m * (34 - ta);
  const radiation = BODY_RADIATION_W_M2K4 * fcl * (tclK2 * tclK2 - trK4);
  const convection = fcl * hc * d;
  const sensitivity = 0.303 * Math.exp(-0.036 * m) + 0.028;
  const pmv =
    sensitivity * (mw - skinDiffusion - sweating - latentRespiration - dryRespiration - radiation - convection);
  const p2 = pmv * pmv;
  const ppd = 100 - 95 * Math.exp(-0.03353 * p2 * p2 - 0.2179 * p2);

  const withinRange =
    met >= PMV_APPLICABILITY_ISO7730.metMin &&
    met <= PMV_APPLICABILITY_ISO7730.metMax &&
    clo <= PMV_APPLICABILITY_ISO7730.cloMax &&
    ta >= PMV_APPLICABILITY_ISO7730.taMinC &&
    ta <= PMV_APPLICABILITY_ISO7730.taMaxC &&
    tr >= PMV_APPLICABILITY_ISO7730.trMinC &&
    tr <= PMV_APPLICABILITY_ISO7730.trMaxC &&
    vr <= PMV_APPLICABILITY_ISO7730.vrMaxMs &&
    pa <= PMV_APPLICABILITY_ISO7730.paMaxPa &&
    pmv >= PMV_APPLICABILITY_ISO7730.pmvMin &&
    pmv <= PMV_APPLICABILITY_ISO7730.pmvMax;

  if (out !== undefined) {
    out.pmv = pmv;
    out.ppd = ppd;
    out.withinRange = withinRange;
    return out;
  }
  return { pmv, ppd, withinRange };
}
