import { createHmac } from 'node:crypto';

/**
 * Hand-made JWTs (RFC 7519, HS256 per RFC 7518 §3.2) built with node:crypto only, so the
 * tests do not trust the library under test to forge its own attacks.
 */
const base64url = (value: object | string): string =>
  Buffer.from(typeof value === 'string' ? value : JSON.stringify(value)).toString('base64url');

export const nowSeconds = (): number => Math.floor(Date.now() / 1000);

export function signHs256(payload: object, secret: string): string {
  const unsigned = `${base64url({ alg: 'HS256', typ: 'JWT' })}.${base64url(payload)}`;
  const signature = createHmac('sha256', secret).update(unsigned).digest('base64url');
  return `${unsigned}.${signature}`;
}

/** An `alg: none` token (no signature). */
export function unsignedToken(payload: object): string {
  return `${base64url({ alg: 'none', typ: 'JWT' })}.${base64url(payload)}.`;
}

/** The payload of a token (without verifying it). */
export function decodePayload(token: string): Record<string, unknown> {
  return JSON.parse(Buffer.from(token.split('.')[1], 'base64url').toString('utf8'));
}
