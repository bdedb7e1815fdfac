/**
 * The package under test, imported from source so that the reference checks need no build.
 * Also a small helper for quoted, rounded values.
 */
export * from '../../packages/vibration/src/index.js';

/** |actual − quoted| ≤ half a unit in the last quoted digit (× (1 + 2·slack)). */
export function roundsTo(actual: number, quoted: string, slackUnits = 0): boolean {
  const m = /^[-+]?(\d*)(?:\.(\d+))?(?:e([-+]?\d+))?$/i.exec(quoted.trim());
  if (!m) throw new Error(`not a number: ${quoted}`);
  const half = 0.5 * 10 ** ((m[3] ? Number(m[3]) : 0) - (m[2] ? m[2].length : 0));
  return Math.abs(actual - Number(quoted)) <= half * (1 + 2 * slackUnits) * (1 + 1e-9);
}
