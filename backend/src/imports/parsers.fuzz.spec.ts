import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CATCH_CSV_COLUMNS } from '@shoalbook/shared';
import { findsInMemory } from '../catches/find-lookup';
import { CompetitionDay } from '../events/competition-day.entity';
import { Lake } from '../lakes/lake.entity';
import { checkCatchRows, parseCatchCsv } from './catch-csv';
import { parseGpx, type GpxWaypoint } from './gpx-parser';
import { ImportFileError } from './import-error';
import { readCatchCsvUpload, readGpxUpload } from './read-upload';
import { assertTextFile } from './sniff';

// Property-based fuzzing of the import parsers (security.md): whatever the input, a parser either returns
// rows, each with a clear per-row error or none, or refuses the whole file with an ImportFileError; no
// other exception ever escapes. Runs are bounded to keep the suite fast.
const RUNS = { numRuns: 200 };

/** Run `fn`; anything thrown other than an ImportFileError fails the property. */
function outcome<T>(fn: () => T): T | ImportFileError {
  try {
    return fn();
  } catch (e) {
    if (e instanceof ImportFileError) return e;
    throw e;
  }
}

function expectRowContract(rows: GpxWaypoint[]): void {
  expect(rows.length).toBeGreaterThan(0);
  rows.forEach((r, i) => {
    expect(r.index).toBe(i);
    expect(typeof r.name).toBe('string');
    expect(r.error === null || (typeof r.error === 'string' && r.error.length > 0)).toBe(true);
    for (const v of [r.lat, r.lon, r.depthFt, r.depthM, r.elevationM])
      expect(v === null || typeof v === 'number').toBe(true);
    if (r.error === null) {
      // A row without an error is importable as it stands: a real position, a real instant, a sane depth.
      expect(r.lat! >= -90 && r.lat! <= 90 && r.lon! >= -180 && r.lon! <= 180).toBe(true);
      if (r.markedAt !== null) expect(new Date(r.markedAt).toISOString()).toBe(r.markedAt);
      if (r.depthM !== null) expect(r.depthM >= 0 && r.depthM <= 400).toBe(true);
    }
  });
}

const xmlText = fc.string({ unit: 'grapheme', maxLength: 40 });
/** Attribute and text values as they occur in real and broken files: numbers, words, XML syntax, entities. */
const fragment = fc.oneof(
  xmlText,
  fc.double().map(String),
  fc.integer({ min: -400, max: 400 }).map(String),
  fc.constantFrom(
    '',
    ' ',
    'NaN',
    'Infinity',
    '1e309',
    '-0',
    '0x1F',
    '&amp;',
    '&lt;',
    '&bogus;',
    ']]>',
    '<',
    '>',
    '"',
    "'",
    '\u0000',
    '2024-04-12T14:03:00Z',
    '2024-02-30T25:61:00Z',
    '2024-04-12',
  ),
);
const waypointXml = fc
  .record({
    lat: fragment,
    lon: fragment,
    name: fc.option(fragment),
    time: fc.option(fragment),
    depth: fc.option(fragment),
    junk: fc.option(fc.constantFrom('<x>', '</wpt>', '<wpt>', '<![CDATA[x]]>', '<!-- c -->', '<a><b><c/></b></a>')),
  })
  .map(
    (w) =>
      `<wpt lat="${w.lat}" lon="${w.lon}">${w.name !== null ? `<name>${w.name}</name>` : ''}${w.time !== null ? `<time>${w.time}</time>` : ''}${
        w.depth !== null ? `<extensions><d:depth xmlns:d="urn:fuzz">${w.depth}</d:depth></extensions>` : ''
      }${w.junk ?? ''}</wpt>`,
  );
const gpxDocument = fc
  .record({
    prolog: fc.constantFrom('<?xml version="1.0" encoding="UTF-8"?>\n', '', '\uFEFF<?xml version="1.0"?>'),
    ns: fc.constantFrom('http://www.topografix.com/GPX/1/1', 'http://www.topografix.com/GPX/1/0', 'urn:other', ''),
    wpts: fc.array(waypointXml, { maxLength: 8 }),
  })
  .map(
    ({ prolog, ns, wpts }) =>
      `${prolog}<gpx version="1.1" creator="fuzz"${ns ? ` xmlns="${ns}"` : ''}>${wpts.join('')}</gpx>`,
  );

describe('GPX parser under fuzzing (fast-check)', () => {
  it('arbitrary text: rows with per-row errors, or a whole-file ImportFileError', () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.string({ maxLength: 400 }), fc.string({ unit: 'binary', maxLength: 400 }), gpxDocument),
        (text) => {
          const result = outcome(() => parseGpx(text));
          if (result instanceof ImportFileError) expect(result.message.length).toBeGreaterThan(0);
          else expectRowContract(result);
        },
      ),
      RUNS,
    );
  });

  it('GPX-shaped documents with junk values: the same contract, and never a DOCTYPE processed', () => {
    fc.assert(
      fc.property(
        gpxDocument,
        fc.option(
          fc.constantFrom(
            '<!DOCTYPE gpx [<!ENTITY x SYSTEM "file:///etc/passwd">]>',
            '<!DOCTYPE gpx>',
            '<!ENTITY a "b">',
          ),
        ),
        (doc, doctype) => {
          const text = doctype ? doc.replace('<gpx ', `${doctype}<gpx `) : doc;
          const result = outcome(() => parseGpx(text));
          if (doctype) expect(result instanceof ImportFileError && result.code === 'dtd_refused').toBe(true);
          else if (!(result instanceof ImportFileError)) expectRowContract(result);
        },
      ),
      RUNS,
    );
  });

  it('well-formed waypoints in range are always accepted with their exact position', () => {
    const name = fc.stringMatching(/^[A-Za-z0-9 ]{1,40}$/);
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            lat: fc.double({ min: -90, max: 90, noNaN: true }),
            lon: fc.double({ min: -180, max: 180, noNaN: true }),
            name,
          }),
          { minLength: 1, maxLength: 6 },
        ),
        (points) => {
          const text = `<gpx xmlns="http://www.topografix.com/GPX/1/1">${points.map((p) => `<wpt lat="${p.lat}" lon="${p.lon}"><name>${p.name}</name></wpt>`).join('')}</gpx>`;
          const rows = parseGpx(text);
          expect(rows.map((r) => r.error)).toEqual(points.map(() => null));
          expect(rows.map((r) => [r.lat, r.lon])).toEqual(
            points.map((p) => [p.lat === 0 ? 0 : p.lat, p.lon === 0 ? 0 : p.lon]),
          );
          expect(rows.map((r) => r.name)).toEqual(points.map((p) => p.name.trim() || expect.any(String)));
        },
      ),
      RUNS,
    );
  });

  it('arbitrary bytes (including binary magic numbers): the upload reader answers with an API error or rows, nothing else', async () => {
    const magic = fc.constantFrom(
      Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
      Buffer.from('%PDF-1.7\n'),
      Buffer.from([0x50, 0x4b, 0x03, 0x04]),
      Buffer.from([0xff, 0xd8, 0xff]),
      Buffer.alloc(0),
    );
    const bytes = fc.oneof(
      fc.uint8Array({ maxLength: 600 }).map((a) => Buffer.from(a)),
      fc.tuple(magic, fc.uint8Array({ maxLength: 200 })).map(([m, rest]) => Buffer.concat([m, Buffer.from(rest)])),
      gpxDocument.map((t) => Buffer.from(t, 'utf8')),
    );
    await fc.assert(
      fc.asyncProperty(bytes, async (buffer) => {
        for (const read of [readGpxUpload, readCatchCsvUpload] as const) {
          try {
            await read(buffer);
          } catch (e) {
            const status = (e as { getStatus?: () => number }).getStatus?.();
            expect(status === 400 || status === 413, `${read.name} threw ${String(e)}`).toBe(true);
          }
        }
        const sniffed = await assertTextFile(buffer, 'a file').catch((e: unknown) => e);
        if (!(sniffed instanceof ImportFileError)) expect(typeof sniffed).toBe('string');
      }),
      RUNS,
    );
  });
});

/** CSV cells as anglers and broken exports write them: quotes, separators, line breaks, formulas, numbers. */
const cell = fc.oneof(
  fc.string({ maxLength: 20 }),
  fc.double().map(String),
  fc.constantFrom(
    '',
    '"',
    '""',
    '"a,b"',
    'a\nb',
    '\r\n',
    ',',
    ';',
    '\t',
    '=cmd()',
    '+1',
    '-1',
    '@x',
    '07:45',
    '25:99',
    '2024-04-13',
    '2024-02-30',
    'largemouth',
    'weighed',
    'lb-oz',
    'kg',
    'mm',
    'm',
    'C',
    '1e309',
    'NaN',
    'Shell bar',
  ),
);
const csvText = fc
  .record({
    header: fc.oneof(
      fc.shuffledSubarray([...CATCH_CSV_COLUMNS], { minLength: 0 }),
      fc.array(fc.string({ maxLength: 12 }), { maxLength: 6 }),
    ),
    rows: fc.array(fc.array(cell, { maxLength: 22 }), { maxLength: 12 }),
    newline: fc.constantFrom('\n', '\r\n'),
  })
  .map(({ header, rows, newline }) => [header.join(','), ...rows.map((r) => r.join(','))].join(newline));

describe('catch CSV parser and row checks under fuzzing (fast-check)', () => {
  const lake = Object.assign(new Lake(), {
    id: '11111111-1111-4111-8111-111111111111',
    crewId: 'c',
    name: 'Fuzz Lake',
    timeZone: 'America/Chicago',
    lat: 32.95,
    lon: -96.2,
  });
  const day = Object.assign(new CompetitionDay(), {
    id: '22222222-2222-4222-8222-222222222222',
    crewId: 'c',
    eventId: 'e',
    date: '2024-04-13',
  });
  const finds = findsInMemory([
    { id: '33333333-3333-4333-8333-333333333333', name: 'Shell bar', lat: 32.951, lon: -96.201 },
  ]);
  const ctx = { lake, finds, photoIds: async () => false };

  it('arbitrary text: a whole-file ImportFileError, or rows each checked with field errors or a record', async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(csvText, fc.string({ maxLength: 300 })), async (text) => {
        const parsed = outcome(() => parseCatchCsv(text));
        if (parsed instanceof ImportFileError) {
          expect(parsed.message.length).toBeGreaterThan(0);
          return;
        }
        const checked = await checkCatchRows('c', 'e', [day], ctx, parsed, []);
        expect(checked).toHaveLength(parsed.rows.length);
        for (const [i, row] of checked.entries()) {
          expect(row.preview).toMatchObject({ index: i, line: i + 2 });
          // Exactly one of: an importable record, or at least one readable error naming a column.
          expect(row.record === null).toBe(row.preview.errors.length > 0);
          for (const e of row.preview.errors) expect(e.field.length > 0 && e.message.length > 0).toBe(true);
          if (row.record) {
            expect(Number.isFinite(row.record.weightLb) && row.record.weightLb >= 0).toBe(true);
            expect(row.record.caughtAt instanceof Date && !Number.isNaN(row.record.caughtAt.getTime())).toBe(true);
          }
        }
      }),
      { numRuns: 150 },
    );
  });
});
