/**
 * SQL literals for the projector's multi-row INSERTs. Building one statement of a few thousand rows as text is
 * several times faster than binding tens of thousands of parameters. Every value passes through `sqlLiteral`:
 * strings are quoted with MariaDB's escapes (as the connectors do with NO_BACKSLASH_ESCAPES off, the default).
 */

const ESCAPES: Record<string, string> = {
  '\0': '\\0',
  '\n': '\\n',
  '\r': '\\r',
  '\b': '\\b',
  '\t': '\\t',
  '\x1a': '\\Z',
  "'": "\\'",
  '"': '\\"',
  '\\': '\\\\',
};

export type ColumnKind = 'str' | 'num' | 'bool' | 'json' | 'instant';

export function sqlString(value: string): string {
  // eslint-disable-next-line no-control-regex -- \x1a (Ctrl-Z) is one of the characters MariaDB's string escaping names
  return `'${value.replace(/[\0\n\r\b\t\x1a'"\\]/g, (c) => ESCAPES[c]!)}'`;
}

/** An instant (epoch ms) as a DATETIME(3) literal in UTC. */
export function sqlInstant(ms: number): string {
  return `'${new Date(ms).toISOString().slice(0, 23).replace('T', ' ')}'`;
}

export function sqlLiteral(value: unknown, kind: ColumnKind): string {
  if (value === null || value === undefined) return 'NULL';
  switch (kind) {
    case 'str':
      return sqlString(String(value));
    case 'num': {
      const n = Number(value);
      if (!Number.isFinite(n)) return 'NULL';
      return String(n);
    }
    case 'bool':
      return value ? '1' : '0';
    case 'json':
      return sqlString(JSON.stringify(value));
    case 'instant':
      return sqlInstant(Number(value));
  }
}

/** A column of a read-model table: the row's property, the table's column and how to write it. */
export interface Column<R> {
  prop: keyof R & string;
  column: string;
  kind: ColumnKind;
}

export interface TableSpec<R> {
  table: string;
  columns: readonly Column<R>[];
  /** Primary key properties. */
  key: readonly (keyof R & string)[];
}

/** A row's primary key as one string (the parts joined by NUL, which no id contains). */
export function rowKey<R>(spec: TableSpec<R>, row: R): string {
  return spec.key.map((k) => String(row[k])).join('\u0000');
}

const snake = (name: string) => name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/** A table spec from `prop: kind` pairs; column names are the snake_case of the property (…Ms dropped for instants). */
export function tableSpec<R>(
  table: string,
  key: readonly (keyof R & string)[],
  columns: Record<keyof R & string, ColumnKind>,
): TableSpec<R> {
  return {
    table,
    key,
    columns: (Object.entries(columns) as [keyof R & string, ColumnKind][]).map(([prop, kind]) => ({
      prop,
      kind,
      column: snake(kind === 'instant' ? prop.replace(/Ms$/, '') : prop),
    })),
  };
}

/** `INSERT INTO t (cols) VALUES (…),(…)` — with `upsert`, ON DUPLICATE KEY UPDATE of every non-key column. */
export function insertSql<R>(spec: TableSpec<R>, rows: readonly R[], upsert = false): string {
  const cols = spec.columns.map((c) => `\`${c.column}\``).join(', ');
  const tuples = rows
    .map((row) => `(${spec.columns.map((c) => sqlLiteral(row[c.prop], c.kind)).join(',')})`)
    .join(',\n');
  let sql = `INSERT INTO \`${spec.table}\` (${cols}) VALUES ${tuples}`;
  if (upsert) {
    const updates = spec.columns
      .filter((c) => !spec.key.includes(c.prop))
      .map((c) => `\`${c.column}\` = VALUES(\`${c.column}\`)`);
    sql += ` ON DUPLICATE KEY UPDATE ${updates.join(', ')}`;
  }
  return sql;
}

/** Statements inserting `rows` in chunks of `chunk` rows. */
export function insertChunks<R>(spec: TableSpec<R>, rows: readonly R[], upsert = false, chunk = 2000): string[] {
  const out: string[] = [];
  for (let i = 0; i < rows.length; i += chunk) out.push(insertSql(spec, rows.slice(i, i + chunk), upsert));
  return out;
}

/** `col IN ('a','b')` for string ids; `FALSE` for an empty list. */
export function inList(column: string, values: Iterable<string>): string {
  const list = [...new Set(values)];
  return list.length ? `\`${column}\` IN (${list.map(sqlString).join(',')})` : 'FALSE';
}

/** A database row (snake_case columns, driver types) → the projector's row. */
export function fromDb<R>(spec: TableSpec<R>, raw: Record<string, unknown>): R {
  const row = {} as Record<string, unknown>;
  for (const c of spec.columns) {
    const v = raw[c.column];
    if (v === null || v === undefined) row[c.prop] = null;
    else if (c.kind === 'num') row[c.prop] = Number(v);
    else if (c.kind === 'bool') row[c.prop] = v === true || Number(v) === 1;
    else if (c.kind === 'json') row[c.prop] = typeof v === 'string' ? JSON.parse(v) : v;
    else if (c.kind === 'instant')
      row[c.prop] = v instanceof Date ? v.getTime() : Date.parse(`${String(v).replace(' ', 'T')}Z`);
    else row[c.prop] = String(v);
  }
  return row as R;
}
