import { describe, expect, it } from 'vitest';
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
});
