const DECIMAL = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;

/**
 * The decimal number `text` times 10^places, as a plain decimal string, computed on the digits
 * (no binary rounding). Used for the power-of-ten unit changes of the format (N/mm ↔ N/m), so
 * that a value written by the export reads back to the very same double: `String(x)` is the
 * shortest decimal that reads back to x, and shifting its point is exact both ways.
 */
export function shiftDecimal(text: string, places: number): string {
  const match = DECIMAL.exec(text.trim());
  if (!match || (match[2] === '' && (match[3] ?? '') === '')) throw new Error(`Not a decimal number: ${text}`);
  const [, sign, whole, fraction = '', exponent = '0'] = match;
  let digits = whole + fraction;
  let point = whole.length + Number(exponent) + places;
  if (point <= 0) {
    digits = '0'.repeat(1 - point) + digits;
    point = 1;
  }
  if (point > digits.length) digits += '0'.repeat(point - digits.length);
  const integer = digits.slice(0, point).replace(/^0+(?=\d)/, '');
  const decimals = digits.slice(point).replace(/0+$/, '');
  const magnitude = decimals ? `${integer}.${decimals}` : integer;
  return sign === '-' && /[1-9]/.test(magnitude) ? `-${magnitude}` : magnitude;
}
