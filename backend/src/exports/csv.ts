/**
 * OWASP CSV injection: a cell a spreadsheet would read as a formula (starting with =, +, -, @, a tab or
 * a carriage return) is prefixed with a single quote, so it shows as text. Applied to every text cell;
 * numbers are written as numbers (a negative number is data, not a formula).
 */
export function neutraliseCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

function quote(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** One CSV cell (RFC 4180 quoting) from any value. */
export function csvCell(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  return quote(neutraliseCell(typeof value === 'string' ? value : JSON.stringify(value)));
}

export function csvLine(values: unknown[]): string {
  return values.map(csvCell).join(',');
}
