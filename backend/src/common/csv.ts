/**
 * CSV writing for exports (RFC 4180: comma-separated, CRLF line ends, fields with a comma, quote
 * or line break quoted and their quotes doubled), with spreadsheet formula injection neutralised:
 * a text cell that begins with = + - @, a tab or a carriage return gets a leading apostrophe, so
 * a spreadsheet shows it as text instead of evaluating it (OWASP "CSV Injection" guidance
 * [common practice]). Numbers are written as numbers: a negative number is not a formula.
 */

/** A value one CSV cell can hold; null and undefined are written as an empty cell. */
export type CsvValue = string | number | boolean | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",\r\n]/;

/** Text with a leading apostrophe when a spreadsheet would read it as a formula. */
export function neutraliseFormula(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** One cell, neutralised and quoted as needed. Non-finite numbers become an empty cell. */
export function csvCell(value: CsvValue): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  const text = neutraliseFormula(value);
  return NEEDS_QUOTES.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One CSV line (without its line end). */
export function csvRow(cells: readonly CsvValue[]): string {
  return cells.map(csvCell).join(',');
}

/** A whole CSV document: every row followed by CRLF. */
export function toCsv(rows: readonly (readonly CsvValue[])[]): string {
  return rows.map((row) => `${csvRow(row)}\r\n`).join('');
}
