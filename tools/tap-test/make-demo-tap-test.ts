/**
 * Writes Tacet's invented demo tap-test record (catalog/demo-tap-test.csv): a raw hammer record
 * (time_s, force_n, acceleration_m_s2 at a constant rate) of the demo's released design
 * "CHW pump P-2 skid", deterministically (seeded noise), from a known one-mass model:
 *
 * - mass 1000 kg (the skid's design mass);
 * - natural frequency 4 % above the design's predicted bounce mode (2.566 Hz with the demo
 *   catalog): the invented installation is a little stiffer than designed, within the default
 *   ±10 % tolerance;
 * - damping ratio 0.05 (more than the springs' 0.008: the pipe and cable connections add some);
 * - five 40 ms half-sine hits of about 1.5 kN every 20 s (time to die away and lines fine enough
 *   for the half-power band), sampled at 100 samples/s, with 0.2 % noise on both channels.
 *
 *   npx tsx tools/tap-test/make-demo-tap-test.ts [--predicted-hz 2.566] [--ratio 1.04] [--out FILE] [--seed 5]
 *
 * Run it again when the demo catalog or the demo design changes the predicted bounce frequency
 * (the design page shows it); packages/server/test/verifications.e2e-spec.ts checks that the demo
 * stays a few per cent off.
 */
import { writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { simulateImpactRecord } from '../../packages/vibration/src/index.js';

const arg = (name: string): string | undefined => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? process.argv[i + 1] : undefined;
};

const MASS_KG = 1000;
const predictedHz = Number(arg('predicted-hz') ?? 2.566);
const ratio = Number(arg('ratio') ?? 1.04);
const seed = Number(arg('seed') ?? 5);
const fn = predictedHz * ratio;
const sampleRateHz = 100;
const spacingS = 20;
const hits = 5;

const record = simulateImpactRecord({
  massKg: MASS_KG,
  stiffnessNPerM: MASS_KG * (2 * Math.PI * fn) ** 2,
  dampingRatio: 0.05,
  sampleRateHz,
  durationS: 1 + hits * spacingS,
  pulses: Array.from({ length: hits }, (_, i) => ({ timeS: 1 + i * spacingS, peakForceN: 1500 + 60 * Math.sin(i * 2.1), durationS: 0.04 })),
  noise: { forceN: 3, accelerationMS2: 0.002, seed },
});

const root = fileURLToPath(new URL('../..', import.meta.url));
const out = resolve(arg('out') ?? join(root, 'catalog', 'demo-tap-test.csv'));
const lines = ['time_s,force_n,acceleration_m_s2'];
record.timeS.forEach((t, i) => {
  lines.push(`${t.toFixed(7)},${record.forceN[i].toPrecision(6)},${record.accelerationMS2[i].toPrecision(6)}`);
});
writeFileSync(out, `${lines.join('\n')}\n`);
console.log(`wrote ${record.timeS.length} samples (true natural frequency ${fn.toFixed(3)} Hz) to ${out}`);
