import { describe, expect, it } from 'vitest';
import { inList, insertSql, sqlInstant, sqlLiteral, sqlString, tableSpec } from './sql-values';

describe('SQL literals', () => {
  it('escapes quotes, backslashes and control characters as MariaDB reads them', () => {
    expect(sqlString(`it's a "rock" \\ pile\n\0\x1a`)).toBe(`'it\\'s a \\"rock\\" \\\\ pile\\n\\0\\Z'`);
  });

  it('writes numbers so they read back to the same double, and non-finite numbers as NULL', () => {
    for (const x of [0.1 + 0.2, 3.1305701, 1e-7, -92.289]) expect(Number(sqlLiteral(x, 'num'))).toBe(x);
    expect(sqlLiteral(Number.NaN, 'num')).toBe('NULL');
    expect(sqlLiteral(null, 'str')).toBe('NULL');
  });

  it('writes instants as UTC DATETIME(3)', () => {
    expect(sqlInstant(Date.UTC(2026, 9, 3, 14, 5, 6, 789))).toBe(`'2026-10-03 14:05:06.789'`);
  });

  it('builds a multi-row upsert that updates every non-key column', () => {
    const spec = tableSpec<{ id: string; name: string; atMs: number }>('t', ['id'], {
      id: 'str',
      name: 'str',
      atMs: 'instant',
    });
    const sql = insertSql(
      spec,
      [
        { id: 'a', name: 'x', atMs: 0 },
        { id: 'b', name: "y'", atMs: 1000 },
      ],
      true,
    );
    expect(sql).toBe(
      "INSERT INTO `t` (`id`, `name`, `at`) VALUES ('a','x','1970-01-01 00:00:00.000'),\n('b','y\\'','1970-01-01 00:00:01.000') ON DUPLICATE KEY UPDATE `name` = VALUES(`name`), `at` = VALUES(`at`)",
    );
  });

  it('never produces an empty IN list', () => {
    expect(inList('id', [])).toBe('FALSE');
    expect(inList('id', ['a', 'a', "b'"])).toBe("`id` IN ('a','b\\'')");
  });
});
