import { describe, expect, it } from 'vitest';
import * as math from 'mathjs';
import { complex, complexAbs, complexAdd, complexArgDeg, complexDiv, complexInv, complexMul, complexScale, complexSub } from './complex.js';
import { logSpace } from './frequency-grid.js';

// Source: mathjs 15 complex arithmetic as an independent implementation.
describe('complex helpers vs mathjs at 200 frequencies', () => {
  it('add, sub, mul, div, inv, abs and arg agree with mathjs', () => {
    const freqs = logSpace(0.1, 1000, 200);
    const m = 500;
    const k = 2e6;
    const c = 2000;
    for (const f of freqs) {
      const w = 2 * Math.PI * f;
      const kd = complex(k - m * w * w, w * c);
      const jw = complex(0, w);
      const mkd = math.complex(k - m * w * w, w * c);
      const mjw = math.complex(0, w);
      const pairs: [ReturnType<typeof complex>, math.Complex][] = [
        [complexAdd(kd, jw), math.add(mkd, mjw) as math.Complex],
        [complexSub(kd, jw), math.subtract(mkd, mjw) as math.Complex],
        [complexMul(kd, jw), math.multiply(mkd, mjw) as math.Complex],
        [complexDiv(jw, kd), math.divide(mjw, mkd) as math.Complex],
        [complexInv(kd), math.inv(mkd) as math.Complex],
        [complexScale(kd, -w * w), math.multiply(mkd, -w * w) as math.Complex],
      ];
      for (const [ours, theirs] of pairs) {
        const scale = Math.max(math.abs(theirs) as unknown as number, 1e-300);
        expect(Math.abs(ours.re - theirs.re) / scale).toBeLessThan(1e-13);
        expect(Math.abs(ours.im - theirs.im) / scale).toBeLessThan(1e-13);
        expect(complexAbs(ours) / scale).toBeCloseTo(1, 12);
        expect(complexArgDeg(ours)).toBeCloseTo(((math.arg(theirs) as number) * 180) / Math.PI, 9);
      }
    }
  });

  it('division by zero gives infinities, never a silent finite value', () => {
    const q = complexDiv(complex(1, 0), complex(0, 0));
    expect(Number.isFinite(q.re)).toBe(false);
    expect(complexDiv(complex(1, 1), complex(0, 2))).toEqual({ re: 0.5, im: -0.5 });
  });
});
