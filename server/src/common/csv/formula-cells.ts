/**
 * CSV injection (OWASP "CSV Injection"): a spreadsheet runs a cell that starts with = + - @, tab
 * or carriage return as a formula. Such text cells are written with a leading apostrophe, which
 * spreadsheets show as text; plain numbers (negative amounts included) are left alone.
 *
 * Leading apostrophes are looked through (`'=x` is escaped to `''=x`), so `restoreCell` undoes
 * exactly what `neutraliseCell` did and an export imported again gives back every value.
 */
const FORMULA = /^'*[=+\-@\t\r]/;
const PLAIN_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

export function neutraliseCell(value: string): string {
  return FORMULA.test(value) && !PLAIN_NUMBER.test(value) ? `'${value}` : value;
}

export function restoreCell(value: string): string {
  return value.startsWith("'") && FORMULA.test(value.slice(1)) ? value.slice(1) : value;
}
