import { DOMParser, type Element, type Node } from '@xmldom/xmldom';
import { units } from '@shoalbook/analytics';
import { FIND_KINDS, FIND_SUB_KINDS, type FindKind } from '@shoalbook/shared';
import { ImportFileError } from './import-error';

/** Limits on a GPX upload (our choices: ample for a season's waypoints, small enough to parse in memory). */
export const GPX_LIMITS = Object.freeze({
  maxBytes: 20 * 1024 * 1024,
  maxDepth: 32,
  maxWaypoints: 50_000,
  maxNameLength: 120,
  maxNotesLength: 5000,
});

/** One `<wpt>` of the file, checked; `error` says why it cannot be imported. */
export interface GpxWaypoint {
  index: number;
  name: string;
  lat: number | null;
  lon: number | null;
  markedAt: string | null;
  /** Depth from a `<depth>` extension (GPX distances are metres), converted to feet. */
  depthFt: number | null;
  /** The depth as it was in the file (metres). */
  depthM: number | null;
  elevationM: number | null;
  /** The waypoint's `<desc>` (GPX 1.1), kept as the find's notes. */
  notes: string;
  /** The waypoint's `<type>` when it names one of Shoalbook's kinds (as our own GPX export writes it). */
  kind: FindKind | null;
  /** The sub-kind from our own extension, when it belongs to `kind`; else ''. */
  subKind: string;
  error: string | null;
}

/** GPX 1.1 and 1.0, and no namespace at all, which several phone and desktop apps write. */
const GPX_NAMESPACES = new Set(['http://www.topografix.com/GPX/1/1', 'http://www.topografix.com/GPX/1/0', '']);
const KINDS: ReadonlySet<string> = new Set(FIND_KINDS);

function childElements(el: Element): Element[] {
  const out: Element[] = [];
  for (let n: Node | null = el.firstChild; n; n = n.nextSibling) if (n.nodeType === 1) out.push(n as Element);
  return out;
}

function childText(el: Element, localName: string): string | null {
  const child = childElements(el).find((c) => c.localName === localName);
  return child ? (child.textContent ?? '').trim() : null;
}

/** Depth of the element tree, iteratively (a deeply nested file must not exhaust the stack). */
function treeDepth(root: Element): number {
  let max = 0;
  const stack: [Element, number][] = [[root, 1]];
  while (stack.length) {
    const [el, d] = stack.pop()!;
    if (d > max) max = d;
    if (d > GPX_LIMITS.maxDepth) return d;
    for (const c of childElements(el)) stack.push([c, d + 1]);
  }
  return max;
}

/** The first element of that local name anywhere under the waypoint's `<extensions>` (any namespace). */
function extensionText(wpt: Element, localName: string): string | null {
  const ext = childElements(wpt).find((c) => c.localName === 'extensions');
  if (!ext) return null;
  const stack = [...childElements(ext)];
  while (stack.length) {
    const el = stack.pop()!;
    if (el.localName === localName) return (el.textContent ?? '').trim();
    stack.push(...childElements(el));
  }
  return null;
}

function findDepthExtension(wpt: Element): number | null {
  const text = extensionText(wpt, 'depth');
  if (text === null) return null;
  const v = Number(text);
  return text !== '' && Number.isFinite(v) ? v : NaN;
}

function parseCoordinate(raw: string | null, name: 'lat' | 'lon'): { value: number | null; error: string | null } {
  const limit = name === 'lat' ? 90 : 180;
  if (raw === null || raw.trim() === '') return { value: null, error: `The waypoint has no ${name} attribute.` };
  const v = Number(raw);
  if (!Number.isFinite(v)) return { value: null, error: `${name} "${raw.slice(0, 40)}" is not a number.` };
  if (v < -limit || v > limit) return { value: v, error: `${name} ${v} is out of range (−${limit} … ${limit}).` };
  return { value: v, error: null };
}

function waypoint(wpt: Element, index: number): GpxWaypoint {
  const errors: string[] = [];
  const lat = parseCoordinate(wpt.getAttribute('lat'), 'lat');
  const lon = parseCoordinate(wpt.getAttribute('lon'), 'lon');
  if (lat.error) errors.push(lat.error);
  if (lon.error) errors.push(lon.error);

  let name = childText(wpt, 'name') ?? '';
  if (name === '') name = `Waypoint ${index + 1}`;
  if (name.length > GPX_LIMITS.maxNameLength)
    errors.push(`The name is longer than ${GPX_LIMITS.maxNameLength} characters.`);

  let markedAt: string | null = null;
  const time = childText(wpt, 'time');
  if (time) {
    const ms = Date.parse(time);
    // GPX times are xsd:dateTime; require a date-time with a zone so the instant is unambiguous.
    if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/.test(time) || Number.isNaN(ms)) {
      errors.push(`The time "${time.slice(0, 40)}" is not an ISO-8601 date-time with a zone.`);
    } else markedAt = new Date(ms).toISOString();
  }

  const eleText = childText(wpt, 'ele');
  const elevationM = eleText !== null && eleText !== '' && Number.isFinite(Number(eleText)) ? Number(eleText) : null;
  let depthM = findDepthExtension(wpt);
  if (depthM !== null && (Number.isNaN(depthM) || depthM < 0 || depthM > 400)) {
    errors.push('The depth extension is not a depth between 0 and 400 m.');
    depthM = null;
  }
  const type = childText(wpt, 'type') ?? '';
  const kind = KINDS.has(type) ? (type as FindKind) : null;
  const subKind = extensionText(wpt, 'subKind') ?? '';
  return {
    index,
    name,
    lat: lat.value,
    lon: lon.value,
    markedAt,
    depthFt: depthM === null ? null : units.mToFt(depthM),
    depthM,
    elevationM,
    notes: (childText(wpt, 'desc') ?? '').slice(0, GPX_LIMITS.maxNotesLength),
    kind,
    subKind: kind && FIND_SUB_KINDS[kind].includes(subKind) ? subKind : '',
    error: errors.length ? errors.join(' ') : null,
  };
}

/**
 * Parse a GPX 1.1 (or 1.0, or namespace-less) file's waypoints. Our own reader on xmldom rather than
 * @tmcw/togeojson: togeojson drops a waypoint whose coordinates do not parse, where the import preview must
 * show that row and say why it cannot be imported. Refuses any DOCTYPE (so no DTD and no entity of any
 * kind, internal or external, is ever processed: no XXE, no entity expansion), files over 20 MB, trees
 * deeper than 32 levels and more than 50,000 waypoints. Per-waypoint problems are reported on the row.
 *
 * @throws ImportFileError for a problem with the whole file
 */
export function parseGpx(text: string): GpxWaypoint[] {
  if (Buffer.byteLength(text, 'utf8') > GPX_LIMITS.maxBytes)
    throw new ImportFileError('file_too_large', 'The GPX file is larger than 20 MB.');
  if (/<!DOCTYPE/i.test(text) || /<!ENTITY/i.test(text)) {
    throw new ImportFileError(
      'dtd_refused',
      'The file declares a DOCTYPE or entities; GPX files never need one, so it is refused.',
    );
  }
  let doc;
  try {
    const parser = new DOMParser({
      onError: (level, message) => {
        if (level !== 'warning') throw new Error(message);
      },
    });
    doc = parser.parseFromString(text, 'text/xml');
  } catch (e) {
    const detail = e instanceof Error ? e.message.split('\n')[0].slice(0, 200) : 'unreadable';
    throw new ImportFileError('malformed_file', `The file is not well-formed XML: ${detail}`);
  }
  const root = doc.documentElement;
  if (!root || root.localName !== 'gpx' || !GPX_NAMESPACES.has(root.namespaceURI ?? '')) {
    throw new ImportFileError(
      'wrong_file_type',
      'The file is XML but not GPX (the root must be <gpx>, in the GPX 1.1 or 1.0 namespace or in none).',
    );
  }
  if (treeDepth(root) > GPX_LIMITS.maxDepth)
    throw new ImportFileError('malformed_file', `The file nests elements deeper than ${GPX_LIMITS.maxDepth} levels.`);
  const wpts = childElements(root).filter((c) => c.localName === 'wpt');
  if (wpts.length > GPX_LIMITS.maxWaypoints)
    throw new ImportFileError(
      'too_many_rows',
      `The file has ${wpts.length} waypoints; at most ${GPX_LIMITS.maxWaypoints} per import.`,
    );
  if (wpts.length === 0)
    throw new ImportFileError(
      'empty_file',
      'The GPX file has no waypoints (<wpt>); tracks and routes are not imported.',
    );
  return wpts.map(waypoint);
}
