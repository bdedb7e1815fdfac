// @ts-check
// What the tests and tools that drive a running server share: the demo accounts, signing in,
// and a design input that carries a tag, so a stored design tells which save wrote it.
// See tools/harness/server.mjs for why this is JavaScript with JSDoc types.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { ROOT } from './server.mjs';

/** The password of every demo account (README.md, demo mode only). */
export const DEMO_PASSWORD = 'tacet-demo';

/** The demo accounts' e-mail addresses by role (the server's `demo-users.seed.ts`). */
export const DEMO_ACCOUNTS = Object.freeze({
  admin: 'admin@tacet.test',
  catalogManager: 'catalog@tacet.test',
  engineer: 'engineer@tacet.test',
  /** A second engineer, who checks the first one's designs. */
  checker: 'checker@tacet.test',
  purchaser: 'buyer@tacet.test',
  viewer: 'viewer@tacet.test',
});

/**
 * Signs in through `POST /api/auth/login`; resolves with the access token.
 * @param {string} baseURL
 * @param {string} email
 * @param {string} [password]
 * @returns {Promise<string>}
 */
export async function signIn(baseURL, email, password = DEMO_PASSWORD) {
  const res = await fetch(`${baseURL}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}: ${await res.text()}`);
  const { accessToken } = /** @type {{ accessToken: string }} */ (await res.json());
  return accessToken;
}

/**
 * A design input as the API takes it (the parts the fixtures touch; the rest passes through).
 * @typedef {{
 *   components: Array<{ name: string, massKg: number, cg: { x: number, y: number, z: number } }>,
 *   mountPoints: Array<{ label: string, x: number, y: number, z: number }>,
 *   [part: string]: unknown,
 * }} DesignInput
 */

// The server's own starting design (packages/server/src/designs/default-design-input.ts), from
// its build, so the fixture stays a valid input whatever the API adds.
const DEFAULT_INPUT = join(ROOT, 'packages/server/dist/designs/default-design-input.js');
if (!existsSync(DEFAULT_INPUT)) throw new Error('The server is not built: run npm run build first');
const { defaultDesignInput } = /** @type {{ defaultDesignInput: () => DesignInput }} */ (await import(pathToFileURL(DEFAULT_INPUT).href));

/** Offset of the tag in the first component's mass (kg). */
const TAG_BASE_KG = 500;

/**
 * The server's default design input (one machine on four corner points, 1480 rpm, common
 * criteria) with the first component's mass set to 500 + `tag` kg.
 * @param {number} tag a whole number ≥ 0
 * @returns {DesignInput}
 */
export function taggedInput(tag) {
  const input = defaultDesignInput();
  input.components[0].massKg = TAG_BASE_KG + tag;
  return input;
}

/**
 * The tag of a design input made by `taggedInput`.
 * @param {{ components: Array<{ massKg: number }> }} input
 */
export function tagOfInput(input) {
  return input.components[0].massKg - TAG_BASE_KG;
}
