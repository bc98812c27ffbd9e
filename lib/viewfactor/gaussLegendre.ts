/**
 * Gauss–Legendre quadrature nodes and weights, on [−1, 1] and mapped to [0, 1].
 */

const cache = new Map<number, readonly [Float64Array, Float64Array]>();

/**
 * Gauss–Legendre nodes and weights on [−1, 1], computed by Newton iteration
 * on the Legendre polynomial P_n from the Chebyshev-like initial guesses
 * cos(π(i − 1/4)/(n + 1/2)), weights 2/((1 − x²) P_n'(x)²) (Abramowitz &
 * Stegun 25.4.29; the classic "gauleg" procedure of Numerical Recipes) [11],
 * [G12]; results cached. Exact for polynomials of degree ≤ 2n − 1.
 * @param n number of points, integer in [1, 256]
 * @returns `[nodes, weights]`, each of length n, nodes ascending; weights sum to 2
 * @throws RangeError for n outside 1…256 or not an integer.
 */
export function gaussLegendre(n: number): readonly [Float64Array, Float64Array] {
  if (!Number.isInteger(n) || n < 1 || n > 256) {
    throw new RangeError(`gaussLegendre: n must be an integer in [1, 256], got ${n}`);
  }
  const hit = cache.get(n);
  if (hit) return hit;
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  const half = Math.floor((n + 1) / 2);
  for (let i = 0; i < half; i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      // Three-term recurrence for P_n(z) and P_{n−1}(z).
      let p0 = 1;
      let p1 = 0;
      for (let j = 1; j <= n; j++) {
        const p2 = p1;
        p1 = p0;
        p0 = ((2 * j - 1) * z * p1 - (j - 1) * p2) / j;
      }
      dp = (n * (z * p0 - p1)) / (z * z - 1);
      const dz = p0 / dp;
      z -= dz;
      if (Math.abs(dz) <= 1e-15) break;
    }
    x[i] = -z;
    x[n - 1 - i] = z;
    const wi = 2 / ((1 - z * z) * dp * dp);
    w[i] = wi;
    w[n - 1 - i] = wi;
  }
  const r = [x, w] as const;
  cache.set(n, r);
  return r;
}

/** Nodes and weights of an n-point Gauss–Legendre rule on [0, 1]. */
export interface QuadratureRule {
  /** Abscissae in (0, 1), ascending. */
  nodes: Float64Array;
  /** Weights, summing to 1. */
  weights: Float64Array;
}

/**
 * The n-point rule of {@link gaussLegendre} mapped to [0, 1] (x ↦ (1 + x)/2,
 * w ↦ w/2), exact for polynomials of degree ≤ 2n − 1.
 * @param n number of points, integer 1…256.
 * @throws RangeError for n outside 1…256 or not an integer.
 */
export function gaussLegendre01(n: number): QuadratureRule {
  const [x, w] = gaussLegendre(n);
  return { nodes: x.map((xi) => 0.5 * (1 + xi)), weights: w.map((wi) => 0.5 * wi) };
}
