import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createTestApp, type TestApp } from './utils/create-test-app.js';

/**
 * A refused figure's bound is stated in the reader's unit system (PRODUCT.md "One voice"): the
 * same body out of range reads "at most 10000000 kg" to a metric reader and "at most
 * 22046226.2 lb" to a US-customary one. Conversions are the exact definitions of NIST SP 811,
 * Appendix B: 1 lb = 0.45359237 kg, 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N; °F = °C × 1.8 + 32.
 */
const LB = 0.45359237;
const IN = 0.0254;
const LBF = 4.4482216152605;

const CORNERS = [
  { label: 'A', x: 2000, y: 0.45, z: 0 }, // beyond the 1000 m any point may lie from the origin
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];
const TOO_BIG = {
  components: [{ name: 'Machine', massKg: 2e7, cg: { x: 0, y: 0, z: 0.3 }, box: { lx: 1.6, ly: 0.9, lz: 0.6 } }],
  mountPoints: CORNERS,
  operating: {
    speedRpm: 1480,
    orders: [1],
    sources: [{ label: 'Shaker', kind: 'force', at: { x: 0, y: 0, z: 0.5 }, axis: 'z', amplitudeN: 2e8, frequencyHz: 100 }],
  },
  criteria: { minIsolationPct: 80, minUtilization: 0.5, maxUtilization: 1.0, ambientTempC: 500 },
  restraint: { sdsG: 1.0, importanceFactor: 1, zOverH: 0.5, snubberGapMm: 500 },
};

/** The bounds of TOO_BIG, per field, as each reader should read them (figures worked out here, not by the app). */
const BOUNDS: Record<string, { SI: string; US: string }> = {
  'components.0.massKg': { SI: '10000000 kg', US: `${(1e7 / LB).toFixed(1)} lb` }, // 22046226.2 lb
  'mountPoints.0.x': { SI: '1000 m', US: `${(1000 / IN).toFixed(2)} in` }, // 39370.08 in
  'operating.sources.0.amplitudeN': { SI: '100000000 N', US: `${(1e8 / LBF).toFixed(0)} lbf` }, // 22480894 lbf
  'restraint.snubberGapMm': { SI: '100 mm', US: `${(0.1 / IN).toFixed(2)} in` }, // 3.94 in
  'criteria.ambientTempC': { SI: '400 °C', US: `${400 * 1.8 + 32} °F` }, // 752 °F
};

interface FieldError {
  field: string;
  message: string;
}

describe('bounds of refused figures in the reader’s units (e2e)', () => {
  let t: TestApp;
  let engineer: string;

  const refusal = async (unitSystem: 'SI' | 'US'): Promise<FieldError[]> => {
    await t.http().patch('/api/auth/me').set('Authorization', `Bearer ${engineer}`).send({ unitSystem }).expect(200);
    const response = await t.http().post('/api/selection').set('Authorization', `Bearer ${engineer}`).send(TOO_BIG).expect(400);
    return response.body.errors as FieldError[];
  };

  beforeAll(async () => {
    t = await createTestApp();
    engineer = await t.loginAs('engineer');
  });
  afterAll(() => t.close());

  it.each(['SI', 'US'] as const)('states every bound in the %s reader’s units, with no mark left', async (system) => {
    const errors = await refusal(system);
    for (const [field, bound] of Object.entries(BOUNDS)) {
      const messages = errors.filter((e) => e.field === field).map((e) => e.message);
      expect({ field, messages }).toEqual({ field, messages: [expect.stringContaining(`at most ${bound[system]}`)] });
    }
    for (const { message } of errors) expect(message).not.toMatch(/[\u27e6\u27e7]/);
    const other = system === 'SI' ? / (lb|lbf|in|°F)\b/ : / (kg|mm|N|m|°C)\b/;
    for (const field of Object.keys(BOUNDS)) {
      for (const { message } of errors.filter((e) => e.field === field)) expect(message).not.toMatch(other);
    }
  });
});
