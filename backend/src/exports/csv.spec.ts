import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { toCsv } from './csv';

/** One CSV data cell written and read back with papaparse (the reader checks the writer's quoting). */
function roundTrip(value: unknown): string {
  const [, row] = Papa.parse<string[]>(toCsv(['c'], [[value]]), { newline: '\r\n' }).data;
  return row![0]!;
}

// OWASP "CSV Injection" page (owasp.org/www-community/attacks/CSV_Injection): cells beginning with = + - @,
// tab or carriage return are prefixed with a single quote so spreadsheets show them as text.
describe('CSV export cells', () => {
  it('neutralises every formula lead character', () => {
    for (const lead of ['=', '+', '-', '@', '\t', '\r'])
      expect(roundTrip(`${lead}HYPERLINK("x")`)).toBe(`'${lead}HYPERLINK("x")`);
    expect(roundTrip('shell bed')).toBe('shell bed');
  });

  it('neutralises a formula after leading spaces (spreadsheets skip them) and the full-width ＝ ＋ － ＠', () => {
    for (const cell of ['  =1+1', ' \u00a0+1', '\u3000@SUM(A1)', '＝1+1', '＋1', '－1', '＠SUM(A1)', ' ＝cmd'])
      expect(roundTrip(cell)).toBe(`'${cell}`);
    expect(roundTrip('a = b')).toBe('a = b');
  });

  it('quotes per RFC 4180 and round-trips through a CSV parser (papaparse); numbers stay numbers', () => {
    const csv = toCsv(['a', 'b', 'c', 'd', 'e', 'f'], [['a, "b"', '=1+1', -2.5, null, true, 'line\nbreak']]);
    expect(csv.endsWith('\r\n')).toBe(true);
    const [header, row] = Papa.parse<string[]>(csv.trimEnd()).data;
    expect(header).toEqual(['a', 'b', 'c', 'd', 'e', 'f']);
    expect(row).toEqual(['a, "b"', "'=1+1", '-2.5', '', 'true', 'line\nbreak']);
    expect(roundTrip(-3)).toBe('-3');
    expect(roundTrip(Number.POSITIVE_INFINITY)).toBe('');
    expect(roundTrip({ a: 1 })).toBe('{"a":1}');
  });
});
