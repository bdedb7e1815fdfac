import { Transform } from 'class-transformer';

/** Trims string input (other types pass through to fail their own validation). */
export const Trim = () => Transform(({ value }) => (typeof value === 'string' ? value.trim() : value));

/** Trims and lower-cases an email address. */
export const NormalizeEmail = () => Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value));
