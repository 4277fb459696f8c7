import { describe, expect, it } from 'vitest';
import { findsToGpx } from '../exports/gpx-export';
import { parseGpx } from './gpx-parser';
import { ImportFileError } from './import-error';

const gpx = (body: string) =>
  `<?xml version="1.0" encoding="UTF-8"?>\n<gpx version="1.1" creator="test" xmlns="http://www.topografix.com/GPX/1/1">${body}</gpx>`;

function codeOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    if (e instanceof ImportFileError) return e.code;
    throw e;
  }
  return 'no error';
}

describe('parseGpx', () => {
  it('reads name, time, position and a depth extension (metres, converted with 1 ft = 0.3048 m)', () => {
    const rows = parseGpx(
      gpx(`<wpt lat="33.25" lon="-96.5"><ele>150.2</ele><time>2024-04-12T14:03:00Z</time><name>Shell flat</name>
        <extensions><x:depth xmlns:x="urn:example">6.096</x:depth></extensions></wpt>
        <wpt lat="33.26" lon="-96.51"></wpt>`),
    );
    expect(rows).toHaveLength(2);
    expect(rows[0]).toMatchObject({
      index: 0,
      name: 'Shell flat',
      lat: 33.25,
      lon: -96.5,
      markedAt: '2024-04-12T14:03:00.000Z',
      depthM: 6.096,
      elevationM: 150.2,
      error: null,
    });
    expect(rows[0].depthFt).toBeCloseTo(20, 9);
    expect(rows[1]).toMatchObject({ name: 'Waypoint 2', markedAt: null, depthFt: null, error: null });
  });

  it('reports bad waypoints on their row', () => {
    const rows = parseGpx(
      gpx(
        `<wpt lat="95" lon="10"/><wpt lat="abc" lon="10"/><wpt lon="10"/><wpt lat="1" lon="2"><time>yesterday</time></wpt>`,
      ),
    );
    expect(rows.map((r) => r.error)).toEqual([
      expect.stringContaining('lat 95 is out of range'),
      expect.stringContaining('is not a number'),
      expect.stringContaining('no lat attribute'),
      expect.stringContaining('not an ISO-8601'),
    ]);
  });

  it('refuses any DOCTYPE (XXE and entity expansion)', () => {
    const xxe = `<?xml version="1.0"?><!DOCTYPE gpx [<!ENTITY x SYSTEM "file:///etc/passwd">]><gpx xmlns="http://www.topografix.com/GPX/1/1"><wpt lat="1" lon="1"><name>&x;</name></wpt></gpx>`;
    expect(codeOf(() => parseGpx(xxe))).toBe('dtd_refused');
  });

  it('refuses malformed XML, XML that is not GPX, and a file without waypoints', () => {
    expect(codeOf(() => parseGpx(gpx('<wpt lat="1" lon="1"><name>x</wpt>')))).toBe('malformed_file');
    expect(codeOf(() => parseGpx('<kml xmlns="http://www.opengis.net/kml/2.2"></kml>'))).toBe('wrong_file_type');
    expect(codeOf(() => parseGpx(gpx('<trk><name>t</name></trk>')))).toBe('empty_file');
  });

  it('refuses a tree nested deeper than the limit', () => {
    const deep = '<extensions>' + '<a>'.repeat(40) + '</a>'.repeat(40) + '</extensions>';
    expect(codeOf(() => parseGpx(gpx(`<wpt lat="1" lon="1">${deep}</wpt>`)))).toBe('malformed_file');
  });

  it('reads a <gpx> root with no namespace, as several phone and desktop apps write it', () => {
    const rows = parseGpx(
      '<?xml version="1.0"?><gpx version="1.1" creator="phone"><wpt lat="33.1" lon="-96.2"><name>Ledge</name></wpt></gpx>',
    );
    expect(rows).toMatchObject([{ name: 'Ledge', lat: 33.1, lon: -96.2, error: null }]);
    // A root in another namespace is still not GPX.
    expect(codeOf(() => parseGpx('<gpx xmlns="urn:not-gpx"><wpt lat="1" lon="1"/></gpx>'))).toBe('wrong_file_type');
  });

  it('keeps each waypoint’s <desc> as notes and a <type> naming one of our kinds (GPX 1.1 schema: wptType)', () => {
    const rows = parseGpx(
      gpx(`<wpt lat="1" lon="1"><name>a</name><desc>Shell on the north lip</desc><type>hard-bottom</type>
        <extensions><sb:subKind xmlns:sb="urn:shoalbook:gpx-extensions:1">rock</sb:subKind></extensions></wpt>
        <wpt lat="1" lon="2"><name>b</name><type>Fishing Hot Spot</type></wpt>
        <wpt lat="1" lon="3"><type>vegetation</type><extensions><subKind>rock</subKind></extensions></wpt>`),
    );
    expect(rows.map((r) => [r.notes, r.kind, r.subKind])).toEqual([
      ['Shell on the north lip', 'hard-bottom', 'rock'],
      ['', null, ''], // a classification that is not one of ours leaves the kind to the import
      ['', 'vegetation', ''], // a sub-kind of another kind is dropped
    ]);
  });

  it('reads back what our own GPX export writes: names, notes, kinds, sub-kinds, times and depths', () => {
    const finds = [
      {
        name: 'Rock & "shell" <ridge>',
        lat: 33.123456,
        lon: -96.654321,
        markedAt: new Date('2025-04-10T13:05:00Z'),
        depthFt: 20,
        kind: 'hard-bottom' as const,
        subKind: 'shell',
        notes: 'Gravel patch on the north lip',
      },
      {
        name: 'Grass edge',
        lat: 33.2,
        lon: -96.7,
        markedAt: null,
        depthFt: null,
        kind: 'vegetation' as const,
        subKind: '',
        notes: '',
      },
    ];
    const text = findsToGpx('Test Lake', finds, new Date('2025-05-01T00:00:00Z'));
    expect(text).toMatch(
      /^<\?xml version="1.0" encoding="UTF-8"\?>\n<gpx [^>]*xmlns="http:\/\/www.topografix.com\/GPX\/1\/1"/,
    );
    expect(text.match(/xmlns:sb=/g)).toHaveLength(1); // declared once, on the root
    const rows = parseGpx(text);
    expect(rows).toHaveLength(2);
    expect(rows[0]).toMatchObject({
      name: finds[0].name,
      lat: finds[0].lat,
      lon: finds[0].lon,
      markedAt: '2025-04-10T13:05:00.000Z',
      kind: 'hard-bottom',
      subKind: 'shell',
      notes: finds[0].notes,
      depthM: 6.096, // 20 ft × 0.3048 m/ft (the international foot, exact)
      error: null,
    });
    expect(rows[0].depthFt).toBeCloseTo(20, 6);
    expect(rows[1]).toMatchObject({
      name: 'Grass edge',
      kind: 'vegetation',
      subKind: '',
      notes: '',
      markedAt: null,
      depthFt: null,
    });
  });
});
