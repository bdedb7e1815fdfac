/**
 * The package's complex FRFs against mathjs complex arithmetic (an independent general-purpose
 * library) at 200 log-spaced frequencies, from the definitions K_d = k − mω² + jωc (viscous) or
 * k(1 + jη) − mω² (hysteretic), α = 1/K_d, Y = jωα, A = −ω²α, Z = K_d/(jω), M_app = −K_d/ω².
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import { type FrfKind, type SdofSystem, hystereticDamping, logSpace, sdofFrf, viscousDamping } from './vibration.js';

const KINDS: FrfKind[] = ['receptance', 'mobility', 'accelerance', 'dynamicStiffness', 'impedance', 'apparentMass'];

function reference(system: SdofSystem, kind: FrfKind, f: number): math.Complex {
  const { massKg: m, stiffnessNPerM: k } = system;
  const w = 2 * Math.PI * f;
  const d = system.damping!;
  const kd =
    d.model === 'viscous'
      ? math.complex(k - m * w * w, w * d.dampingRatio * 2 * Math.sqrt(k * m))
      : (math.subtract(math.multiply(math.complex(1, d.lossFactor), k), m * w * w) as math.Complex);
  const jw = math.complex(0, w);
  const alpha = math.divide(1, kd) as math.Complex;
  switch (kind) {
    case 'receptance':
      return alpha;
    case 'mobility':
      return math.multiply(jw, alpha) as math.Complex;
    case 'accelerance':
      return math.multiply(-w * w, alpha) as math.Complex;
    case 'dynamicStiffness':
      return kd;
    case 'impedance':
      return math.divide(kd, jw) as math.Complex;
    case 'apparentMass':
      return math.divide(math.unaryMinus(kd), w * w) as math.Complex;
  }
}

describe('FRFs vs mathjs complex arithmetic at 200 frequencies', () => {
  const systems: [string, SdofSystem][] = [
    ['viscous (CV-02 system)', { massKg: 500, stiffnessNPerM: 2e6, damping: viscousDamping(2000 / (2 * Math.sqrt(1e9))) }],
    ['viscous, heavy', { massKg: 37, stiffnessNPerM: 8.1e4, damping: viscousDamping(0.45) }],
    ['hysteretic', { massKg: 1200, stiffnessNPerM: 3.3e6, damping: hystereticDamping(0.18) }],
  ];
  const freqs = logSpace(0.1, 500, 200);
  for (const [name, system] of systems) {
    for (const kind of KINDS) {
      it(`${name}: ${kind}`, () => {
        const curve = sdofFrf(system, kind, freqs);
        expect(curve.re.length).toBe(200);
        for (let i = 0; i < freqs.length; i++) {
          const ref = reference(system, kind, freqs[i]);
          const mag = math.abs(ref) as unknown as number;
          expect(Math.abs(curve.re[i] - ref.re) / mag).toBeLessThan(1e-12);
          expect(Math.abs(curve.im[i] - ref.im) / mag).toBeLessThan(1e-12);
          expect(curve.magnitude[i] / mag).toBeCloseTo(1, 12);
          expect(curve.phaseDeg[i]).toBeCloseTo(((math.arg(ref) as number) * 180) / Math.PI, 8);
        }
      });
    }
  }
});
