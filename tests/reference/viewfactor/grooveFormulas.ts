/** Closed forms used as references by the V-groove checks (tests/reference/viewfactor, tests/reference/panels). */

/**
 * Closed form for a specular V-groove of opening angle α = 180°/n (computed
 * independently here): images close into a regular k-gon (k = 2n) inscribed
 * in the unit circle; chord m's share is the crossed-string view factor
 * F(0→m) = [2 sin(mα/2) − sin((m−1)α/2) − sin((m+1)α/2)] / (2 sin(α/2)),
 * and a ray leaving through chord m was reflected min(m, k − m) times (image method:
 * Modest & Mazumder, Radiative Heat Transfer; crossed strings: Hottel & Sarofim — from memory).
 */
export function specularClosedForm(n: number, emissivity: number): number {
  const alpha = Math.PI / n;
  const k = 2 * n;
  let total = 0;
  for (let m = 1; m < k; m++) {
    const f = (2 * Math.sin((m * alpha) / 2) - Math.sin(((m - 1) * alpha) / 2) - Math.sin(((m + 1) * alpha) / 2)) / (2 * Math.sin(alpha / 2));
    total += f * (1 - Math.pow(1 - emissivity, Math.min(m, k - m)));
  }
  return total;
}
