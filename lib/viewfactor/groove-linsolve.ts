/**
 * Dense linear solve for the V-groove radiosity systems.
 */

/**
 * Solves A·x = b in place by Gaussian elimination with partial pivoting
 * (row-major dense storage) [G10]. `a` and `b` are overwritten; the
 * solution is written into `b` and returned.
 * @param a n×n matrix, row-major, length n² (overwritten with the LU factors)
 * @param b right-hand side, length n (overwritten with the solution)
 * @param n system size, integer ≥ 1
 * @throws RangeError on wrong lengths or a singular (zero-pivot) matrix
 */
export function solveDenseInPlace(a: Float64Array, b: Float64Array, n: number): Float64Array {
  if (!Number.isInteger(n) || n < 1 || a.length !== n * n || b.length !== n) {
    throw new RangeError(`solveDenseInPlace: expected an ${n}×${n} matrix and a length-${n} vector`);
  }
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = Math.abs(a[k * n + k] as number);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k] as number);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    if (!(best > 0)) throw new RangeError("solveDenseInPlace: singular matrix");
    if (p !== k) {
      for (let j = k; j < n; j++) {
        const tmp = a[k * n + j] as number;
        a[k * n + j] = a[p * n + j] as number;
        a[p * n + j] = tmp;
      }
      const tb = b[k] as number;
      b[k] = b[p] as number;
      b[p] = tb;
    }
    const pivot = a[k * n + k] as number;
    const rowK = k * n;
    for (let i = k + 1; i < n; i++) {
      const rowI = i * n;
      const f = (a[rowI + k] as number) / pivot;
      if (f === 0) continue;
      for (let j = k + 1; j < n; j++) a[rowI + j] = (a[rowI + j] as number) - f * (a[rowK + j] as number);
      b[i] = (b[i] as number) - f * (b[k] as number);
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i] as number;
    const row = i * n;
    for (let j = i + 1; j < n; j++) s -= (a[row + j] as number) * (b[j] as number);
    b[i] = s / (a[row + i] as number);
  }
  return b;
}
