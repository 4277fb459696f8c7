import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import Papa from 'papaparse';
import { CATCH_CSV_COLUMNS, type CatchImportPreview, type CatchImportRow } from '@shoalbook/shared';
import { Catch } from '../catches/catch.entity';
import { applyCatchInput, type ImportCatchContext } from '../catches/catch-input';
import { LogCatchDto } from '../catches/dto/catch.dto';
import { toFieldErrors } from '../common/pipes/api-validation.pipe';
import type { CompetitionDay } from '../events/competition-day.entity';
import { FieldProblems } from '../journal/journal-errors';
import { type CatchIdentity, findCatchDuplicates } from './catch-duplicates';
import { ImportFileError } from './import-error';

/** Limits on a catch CSV (our choices). */
export const CSV_LIMITS = Object.freeze({ maxBytes: 5 * 1024 * 1024, maxRows: 20_000 });
const REQUIRED = ['date', 'time', 'species', 'weight', 'fate'] as const;

/** Which CSV column a request field came from, so errors point at the angler's column. */
const COLUMN_OF: Record<string, string> = {
  caughtAt: 'time',
  competitionDayId: 'date',
  weightLb: 'weight',
  weight: 'weight',
  'weight.value': 'weight',
  'weight.unit': 'weight_unit',
  'weight.ounces': 'weight_oz',
  length: 'length',
  lengthIn: 'length',
  'length.value': 'length',
  'length.unit': 'length_unit',
  depth: 'depth',
  depthFt: 'depth',
  'depth.value': 'depth',
  'depth.unit': 'depth_unit',
  waterTemp: 'water_temp',
  waterTempF: 'water_temp',
  'waterTemp.value': 'water_temp',
  'waterTemp.unit': 'water_temp_unit',
  findId: 'find_name',
};

export interface ParsedCsv {
  rows: Record<string, string>[];
}

/** Parse the CSV text: a header with our columns (any order), one catch per line. */
export function parseCatchCsv(text: string): ParsedCsv {
  if (Buffer.byteLength(text, 'utf8') > CSV_LIMITS.maxBytes)
    throw new ImportFileError('file_too_large', 'The CSV file is larger than 5 MB.');
  const result = Papa.parse<Record<string, string>>(text, {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const fatal = result.errors.find((e) => e.type === 'Quotes' || e.type === 'Delimiter');
  if (fatal)
    throw new ImportFileError(
      'malformed_file',
      `The CSV cannot be read: ${fatal.message}${fatal.row !== undefined ? ` (row ${fatal.row + 1})` : ''}.`,
    );
  const header = result.meta.fields ?? [];
  const unknown = header.filter((h) => !(CATCH_CSV_COLUMNS as readonly string[]).includes(h));
  if (unknown.length)
    throw new ImportFileError(
      'malformed_file',
      `Unknown column(s): ${unknown.join(', ')}. Use the template's columns: ${CATCH_CSV_COLUMNS.join(', ')}.`,
    );
  const missing = REQUIRED.filter((c) => !header.includes(c));
  if (missing.length) throw new ImportFileError('malformed_file', `Missing column(s): ${missing.join(', ')}.`);
  if (result.data.length === 0) throw new ImportFileError('empty_file', 'The CSV has a header but no catches.');
  if (result.data.length > CSV_LIMITS.maxRows)
    throw new ImportFileError(
      'too_many_rows',
      `The CSV has ${result.data.length} rows; at most ${CSV_LIMITS.maxRows} per import.`,
    );
  return { rows: result.data };
}

const blank = (v: string | undefined) => v === undefined || v.trim() === '';

/** One CSV row → the same request a form would send (checked by the same DTO and rules). */
function rowToRequest(
  row: Record<string, string>,
  day: CompetitionDay | undefined,
  findId: string | undefined,
  problems: FieldProblems,
): Record<string, unknown> {
  const num = (column: string): number | undefined => {
    const raw = row[column];
    if (blank(raw)) return undefined;
    const v = Number(raw!.trim());
    if (!Number.isFinite(v)) problems.add(column, `"${raw!.slice(0, 30)}" is not a number.`);
    return v;
  };
  const text = (column: string) => (blank(row[column]) ? undefined : row[column]!.trim());
  const req: Record<string, unknown> = {
    competitionDayId: day?.id ?? '00000000-0000-4000-8000-000000000000',
    caughtAt: text('time') ?? '',
    species: text('species')?.toLowerCase(),
    fate: text('fate')?.toLowerCase(),
    lure: text('lure'),
    technique: text('technique'),
    notes: text('notes'),
  };
  const weight = num('weight');
  if (weight !== undefined) {
    const unit = text('weight_unit')?.toLowerCase() ?? 'lb';
    const oz = num('weight_oz');
    req.weight = { value: weight, unit, ...(oz !== undefined || unit === 'lb-oz' ? { ounces: oz ?? 0 } : {}) };
  }
  const measured = (column: string, field: string, defaultUnit: string) => {
    const value = num(column);
    if (value !== undefined) req[field] = { value, unit: text(`${column}_unit`) ?? defaultUnit };
  };
  measured('length', 'length', 'in');
  measured('depth', 'depth', 'ft');
  measured('water_temp', 'waterTemp', 'F');
  const lat = num('lat');
  const lon = num('lon');
  if (lat !== undefined || lon !== undefined) Object.assign(req, { lat: lat ?? null, lon: lon ?? null });
  if (findId) req.findId = findId;
  for (const k of Object.keys(req)) if (req[k] === undefined) delete req[k];
  return req;
}

export interface CheckedCatchRow {
  preview: CatchImportRow;
  record: Catch | null;
}

/**
 * Check every row against the same DTO and rules as the form (LogCatchDto, applyCatchInput), for the
 * event's competition days, and mark the rows that repeat a catch of `existing` or an earlier line;
 * nothing is written here.
 */
export async function checkCatchRows(
  crewId: string,
  eventId: string,
  days: CompetitionDay[],
  ctx: ImportCatchContext,
  parsed: ParsedCsv,
  existing: readonly CatchIdentity[],
): Promise<CheckedCatchRow[]> {
  const dayByDate = new Map(days.map((d) => [d.date, d]));
  const findsByName = new Map<string, string[]>();
  for (const f of ctx.finds.all)
    findsByName.set(f.name.toLowerCase(), [...(findsByName.get(f.name.toLowerCase()) ?? []), f.id]);
  const out: CheckedCatchRow[] = [];
  for (const [index, row] of parsed.rows.entries()) {
    const problems = new FieldProblems();
    const date = row.date?.trim() ?? '';
    const day = dayByDate.get(date);
    if (!day)
      problems.add(
        'date',
        `"${date.slice(0, 20)}" is not one of the event's competition days (${days.map((d) => d.date).join(', ')}).`,
      );
    let findId: string | undefined;
    const findName = row.find_name?.trim();
    if (findName) {
      const ids = findsByName.get(findName.toLowerCase()) ?? [];
      if (ids.length === 0) problems.add('find_name', `No find named "${findName.slice(0, 60)}" on this lake.`);
      else if (ids.length > 1)
        problems.add(
          'find_name',
          `${ids.length} finds on this lake are named "${findName.slice(0, 60)}"; rename one, or use lat/lon.`,
        );
      else findId = ids[0];
    }
    const dto = plainToInstance(LogCatchDto, rowToRequest(row, day, findId, problems));
    const validation = toFieldErrors(await validate(dto, { whitelist: true, forbidNonWhitelisted: true }));
    for (const [field, messages] of Object.entries(validation))
      if (field !== 'competitionDayId') messages.forEach((m) => problems.add(COLUMN_OF[field] ?? field, m));
    let record: Catch | null = null;
    if (day && problems.empty) {
      const c = Object.assign(new Catch(), { crewId, eventId, competitionDayId: day.id });
      const rowProblems = new FieldProblems();
      await applyCatchInput({ ...ctx, day }, c, dto, rowProblems);
      for (const [field, messages] of Object.entries(rowProblems.errors))
        messages.forEach((m) => problems.add(COLUMN_OF[field] ?? field, m));
      if (problems.empty) record = c;
    }
    out.push({
      record,
      preview: {
        index,
        line: index + 2,
        caughtAt: record?.caughtAt.toISOString() ?? null,
        species: record?.species ?? null,
        weightLb: record?.weightLb ?? null,
        lengthIn: record?.lengthIn ?? null,
        findId: record?.findId ?? null,
        attributionDistanceM: record?.attributionDistanceM ?? null,
        weightFlagged: record?.weightFlagged ?? false,
        duplicateOf: null,
        errors: Object.entries(problems.errors).flatMap(([field, messages]) =>
          messages.map((message) => ({ field, message })),
        ),
      },
    });
  }
  const valid = out.filter((r) => r.record);
  const duplicates = findCatchDuplicates(
    existing,
    valid.map((r) => ({ ...r.record!, id: null, line: r.preview.line })),
  );
  valid.forEach((r, i) => (r.preview.duplicateOf = duplicates[i]!));
  return out;
}

export function previewOf(rows: CheckedCatchRow[]): CatchImportPreview {
  const rejected = rows.filter((r) => r.preview.errors.length).length;
  const duplicates = rows.filter((r) => r.preview.duplicateOf).length;
  return { rows: rows.map((r) => r.preview), accepted: rows.length - rejected, rejected, duplicates };
}

/** The downloadable template: the header and one example row. */
export function catchCsvTemplate(): string {
  const example = [
    '2024-04-13',
    '07:45',
    'largemouth',
    '3',
    'lb-oz',
    '4',
    '18.5',
    'in',
    'weighed',
    'jig',
    'dragging',
    '14',
    'ft',
    '64',
    'F',
    '',
    '',
    '',
    'first bite',
  ];
  return `${CATCH_CSV_COLUMNS.join(',')}\r\n${example.join(',')}\r\n`;
}
