/**
 * Helpers of the whole-machine reference checks, written without the package: the peak of a
 * harmonic vector over a cycle found by searching the phase.
 */

/**
 * max over φ of ‖Re(v·e^{iφ})‖ for a complex vector v (given as real and imaginary parts), by a
 * scan of 720 phases and a bisection-style refinement around the best one (to ~1e-13 rad).
 */
export function peakByPhaseSearch(re: readonly number[], im: readonly number[]): number {
  const at = (phi: number) => {
    const c = Math.cos(phi);
    const s = Math.sin(phi);
    let sum = 0;
    for (let k = 0; k < re.length; k++) sum += (re[k] * c - im[k] * s) ** 2;
    return Math.sqrt(sum);
  };
  let bestPhi = 0;
  let best = at(0);
  for (let i = 1; i < 720; i++) {
    const phi = (Math.PI * i) / 720; // the magnitude has period π
    const v = at(phi);
    if (v > best) [best, bestPhi] = [v, phi];
  }
  for (let h = Math.PI / 720; h > 1e-13; h /= 2) {
    for (const phi of [bestPhi - h, bestPhi + h]) {
      const v = at(phi);
      if (v > best) [best, bestPhi] = [v, phi];
    }
  }
  return best;
}
