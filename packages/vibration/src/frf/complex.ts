/**
 * Small complex-number helpers for the FRF code. Plain objects, no classes, so that results
 * serialise to JSON unchanged. Checked against mathjs complex arithmetic in the tests.
 */

/** A complex number re + j·im. */
export interface Complex {
  re: number;
  im: number;
}

/** Builds re + j·im. */
export const complex = (re: number, im = 0): Complex => ({ re, im });
/** a + b */
export const complexAdd = (a: Complex, b: Complex): Complex => ({ re: a.re + b.re, im: a.im + b.im });
/** a − b */
export const complexSub = (a: Complex, b: Complex): Complex => ({ re: a.re - b.re, im: a.im - b.im });
/** a·b */
export const complexMul = (a: Complex, b: Complex): Complex => ({
  re: a.re * b.re - a.im * b.im,
  im: a.re * b.im + a.im * b.re,
});
/** s·a for a real s */
export const complexScale = (a: Complex, s: number): Complex => ({ re: a.re * s, im: a.im * s });

/** a/b (Smith's algorithm, avoids overflow for large |b|). Division by 0 gives infinities. */
export function complexDiv(a: Complex, b: Complex): Complex {
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    if (b.re === 0) return { re: a.re / 0, im: a.im / 0 };
    const q = b.im / b.re;
    const d = b.re + b.im * q;
    return { re: (a.re + a.im * q) / d, im: (a.im - a.re * q) / d };
  }
  const q = b.re / b.im;
  const d = b.re * q + b.im;
  return { re: (a.re * q + a.im) / d, im: (a.im * q - a.re) / d };
}

/** 1/a */
export const complexInv = (a: Complex): Complex => complexDiv({ re: 1, im: 0 }, a);
/** |a| */
export const complexAbs = (a: Complex): number => Math.hypot(a.re, a.im);
/** Phase of a in degrees, atan2(im, re), in (−180°, 180°]. */
export const complexArgDeg = (a: Complex): number => (Math.atan2(a.im, a.re) * 180) / Math.PI + 0;
