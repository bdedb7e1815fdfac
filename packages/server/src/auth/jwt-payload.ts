import type { Role } from '../common/roles.js';

/** What a Tacet access token carries. */
export interface JwtPayload {
  sub: number;
  role: Role;
}

/** Lifetime of an access token. */
export const TOKEN_LIFETIME = '12h';

/** The only signing algorithm accepted (`alg: none` and others are rejected). */
export const JWT_ALGORITHM = 'HS256';
