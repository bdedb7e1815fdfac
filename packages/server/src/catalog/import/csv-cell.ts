/** Characters that make a spreadsheet read a cell as a formula (OWASP "CSV injection"). */
const FORMULA_START = /^[=+\-@\t\r]/;

/** A number as the catalog format writes it (these never need a guard, even when negative). */
const PLAIN_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * Guards a text cell for spreadsheets: a value starting with `=`, `+`, `-`, `@`, tab or CR is
 * prefixed with `'`. The import removes that prefix again from text columns, so an exported
 * file imports unchanged.
 */
export function guardFormula(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** Guards a cell of unknown kind (a rejected row's original field): plain numbers stay as they are. */
export function guardCell(text: string): string {
  return PLAIN_NUMBER.test(text.trim()) ? text : guardFormula(text);
}
