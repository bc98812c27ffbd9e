/**
 * Gauss–Legendre quadrature nodes and weights on [0, 1].
 */

/** Nodes and weights of an n-point Gauss–Legendre rule on [0, 1]. */
export interface QuadratureRule {
  /** Abscissae in (0, 1), ascending. */
  nodes: Float64Array;
  /** Weights, summing to 1. */
  weights: Float64Array;
}

/**
 * n-point Gauss–Legendre rule mapped to [0, 1], exact for polynomials of
 * degree ≤ 2n − 1. Nodes are the roots of the Legendre polynomial P_n found
 * by Newton's method from the Chebyshev-like initial guess
 * cos(π(i − 1/4)/(n + 1/2)), weights 2/((1 − x²) P_n'(x)²) (Abramowitz &
 * Stegun 25.4.29; the classic "gauleg" procedure of Numerical Recipes) [11].
 * @param n number of points, integer 1…64.
 * @throws RangeError for n outside 1…64 or not an integer.
 */
export function gaussLegendre01(n: number): QuadratureRule {
  if (!Number.isInteger(n) || n < 1 || n > 64) {
    throw new RangeError("gaussLegendre01: n must be an integer in 1…64");
  }
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      // Legendre recurrence for P_n(x) and its derivative.
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      const pn = n === 1 ? x : p1;
      const pnm1 = n === 1 ? 1 : p0;
      dp = (n * (x * pn - pnm1)) / (x * x - 1);
      const dx = pn / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-16) break;
    }
    // Recompute the derivative at the converged root.
    let p0 = 1;
    let p1 = x;
    for (let k = 2; k <= n; k++) {
      const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
      p0 = p1;
      p1 = p2;
    }
    dp = n === 1 ? 1 : (n * (x * p1 - p0)) / (x * x - 1);
    const w = 2 / ((1 - x * x) * dp * dp);
    // Map [-1, 1] → [0, 1]; roots come out in descending x, store ascending.
    nodes[n - 1 - i] = 0.5 * (1 + x);
    weights[n - 1 - i] = 0.5 * w;
  }
  return { nodes, weights };
}
