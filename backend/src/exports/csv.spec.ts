import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { csvCell, csvLine, neutraliseCell } from './csv';

// OWASP "CSV Injection": cells beginning with = + - @ tab or carriage return must not be read as formulas.
describe('CSV cells', () => {
  it('neutralises every formula lead character', () => {
    for (const lead of ['=', '+', '-', '@', '\t', '\r'])
      expect(neutraliseCell(`${lead}HYPERLINK("x")`)).toBe(`'${lead}HYPERLINK("x")`);
    expect(neutraliseCell('shell bed')).toBe('shell bed');
  });

  it('quotes per RFC 4180 and round-trips through a CSV parser (papaparse)', () => {
    const line = csvLine(['a, "b"', '=1+1', -2.5, null, true, 'line\nbreak']);
    const [row] = Papa.parse<string[]>(line).data;
    expect(row).toEqual(['a, "b"', "'=1+1", '-2.5', '', 'true', 'line\nbreak']);
    expect(csvCell(-3)).toBe('-3');
  });
});
