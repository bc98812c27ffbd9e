/**
 * Vitest setup for the unit and reference tests: fast-check properties run from one fixed
 * seed, so `npm test` gives the same verdict on every machine and every run. To explore
 * other inputs, run with SEATWISE_FC_SEED=<integer> (or `random`); a failure prints the
 * seed and path that replay it.
 */
import fc from "fast-check";

const FIXED_SEED = 20261201;
const requested = process.env.SEATWISE_FC_SEED;

if (requested !== "random") {
  const seed = requested === undefined ? FIXED_SEED : Number.parseInt(requested, 10);
  if (!Number.isSafeInteger(seed)) throw new Error(`SEATWISE_FC_SEED must be an integer or "random", got "${requested}"`);
  fc.configureGlobal({ seed });
}
