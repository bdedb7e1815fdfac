/**
 * Small dense complex linear solve for the whole-machine kernel (internal, not exported from the
 * package): Gaussian elimination with partial pivoting, in place, no allocation.
 */

/** A pivot smaller than this share of the largest entry of A counts as zero (singular A). */
const SINGULAR_SHARE = 1e-14;

/**
 * Solves A·x = b for complex A (n×n, row-major, split into real and imaginary arrays) and b (n).
 * A is overwritten; x is written over b.
 * @returns false when A is singular to working precision (b is then undefined)
 */
export function solveComplexInPlace(n: number, aRe: Float64Array, aIm: Float64Array, bRe: Float64Array, bIm: Float64Array): boolean {
  let scale = 0;
  for (let i = 0; i < n * n; i++) {
    const m = Math.abs(aRe[i]) + Math.abs(aIm[i]);
    if (m > scale) scale = m;
  }
  if (!(scale > 0) || !Number.isFinite(scale)) return false;
  const tiny = SINGULAR_SHARE * scale;
  for (let c = 0; c < n; c++) {
    // pivot: the largest |a_rc| in column c at or below the diagonal
    let p = c;
    let best = aRe[c * n + c] * aRe[c * n + c] + aIm[c * n + c] * aIm[c * n + c];
    for (let r = c + 1; r < n; r++) {
      const m = aRe[r * n + c] * aRe[r * n + c] + aIm[r * n + c] * aIm[r * n + c];
      if (m > best) {
        best = m;
        p = r;
      }
    }
    if (!(Math.sqrt(best) > tiny)) return false;
    if (p !== c) {
      for (let k = c; k < n; k++) {
        let t = aRe[c * n + k];
        aRe[c * n + k] = aRe[p * n + k];
        aRe[p * n + k] = t;
        t = aIm[c * n + k];
        aIm[c * n + k] = aIm[p * n + k];
        aIm[p * n + k] = t;
      }
      let t = bRe[c];
      bRe[c] = bRe[p];
      bRe[p] = t;
      t = bIm[c];
      bIm[c] = bIm[p];
      bIm[p] = t;
    }
    // 1/pivot
    const pr = aRe[c * n + c];
    const pi = aIm[c * n + c];
    const invRe = pr / best;
    const invIm = -pi / best;
    for (let r = c + 1; r < n; r++) {
      const xr = aRe[r * n + c];
      const xi = aIm[r * n + c];
      if (xr === 0 && xi === 0) continue;
      // l = a_rc / a_cc
      const lr = xr * invRe - xi * invIm;
      const li = xr * invIm + xi * invRe;
      aRe[r * n + c] = 0;
      aIm[r * n + c] = 0;
      for (let k = c + 1; k < n; k++) {
        const ur = aRe[c * n + k];
        const ui = aIm[c * n + k];
        aRe[r * n + k] -= lr * ur - li * ui;
        aIm[r * n + k] -= lr * ui + li * ur;
      }
      const br = bRe[c];
      const bi = bIm[c];
      bRe[r] -= lr * br - li * bi;
      bIm[r] -= lr * bi + li * br;
    }
  }
  // back substitution
  for (let r = n - 1; r >= 0; r--) {
    let sr = bRe[r];
    let si = bIm[r];
    for (let k = r + 1; k < n; k++) {
      const ar = aRe[r * n + k];
      const ai = aIm[r * n + k];
      sr -= ar * bRe[k] - ai * bIm[k];
      si -= ar * bIm[k] + ai * bRe[k];
    }
    const dr = aRe[r * n + r];
    const di = aIm[r * n + r];
    const d2 = dr * dr + di * di;
    bRe[r] = (sr * dr + si * di) / d2;
    bIm[r] = (si * dr - sr * di) / d2;
  }
  return true;
}
