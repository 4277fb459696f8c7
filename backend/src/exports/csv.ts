import Papa from 'papaparse';

/**
 * Cells a spreadsheet would read as a formula (OWASP "CSV Injection"): a leading =, +, -, @, tab or carriage
 * return, and also those four signs after leading whitespace (spreadsheets skip it) or in their full-width
 * forms ＝ ＋ － ＠ (U+FF1D, U+FF0B, U+FF0D, U+FF20), which some spreadsheets normalise to the ASCII ones.
 */
export const FORMULA_LEAD = /^(?:[\t\r]|\s*[=+\-@\uFF1D\uFF0B\uFF0D\uFF20])/u;

/** What papaparse writes for a value: numbers stay numbers (a negative number is data, not a formula). */
function cellValue(value: unknown): string | number | boolean {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? value : '';
  if (typeof value === 'boolean' || typeof value === 'string') return value;
  return JSON.stringify(value);
}

/**
 * A whole CSV document (RFC 4180: CRLF line ends, quoting by papaparse's unparse), with every text cell that
 * matches FORMULA_LEAD prefixed by a single quote (papaparse's escapeFormulae) so it shows as text.
 */
export function toCsv(columns: readonly string[], rows: unknown[][]): string {
  const csv = Papa.unparse(
    { fields: [...columns], data: rows.map((r) => r.map(cellValue)) },
    { escapeFormulae: FORMULA_LEAD, newline: '\r\n' },
  );
  return `${csv}\r\n`;
}
