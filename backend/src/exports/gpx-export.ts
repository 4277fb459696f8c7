import { DOMImplementation, XMLSerializer } from '@xmldom/xmldom';
import { units } from '@shoalbook/analytics';
import type { FindKind } from '@shoalbook/shared';

/** GPX 1.1 (topografix.com/GPX/1/1); our own fields live in extensions under our own namespace. */
export const GPX_NS = 'http://www.topografix.com/GPX/1/1';
export const SHOALBOOK_GPX_NS = 'urn:shoalbook:gpx-extensions:1';

export interface GpxFind {
  name: string;
  lat: number;
  lon: number;
  markedAt: Date | null;
  depthFt: number | null;
  kind: FindKind;
  subKind: string;
  notes: string;
}

/**
 * A lake's finds as GPX 1.1 waypoints that our own import reads back: `<type>` carries the kind (GPX's
 * "classification" of a waypoint), `<desc>` the notes, and the extensions the depth in metres (GPX distances
 * are metres) and the sub-kind. Built with xmldom's DOM and serializer, so every name and note is escaped.
 */
export function findsToGpx(lakeName: string, finds: readonly GpxFind[], exportedAt: Date): string {
  const doc = new DOMImplementation().createDocument(GPX_NS, 'gpx', null);
  const gpx = doc.documentElement!;
  gpx.setAttribute('version', '1.1');
  gpx.setAttribute('creator', 'Shoalbook');
  gpx.setAttributeNS('http://www.w3.org/2000/xmlns/', 'xmlns:sb', SHOALBOOK_GPX_NS);
  const el = (parent: typeof gpx, name: string, text?: string) => {
    const child = name.startsWith('sb:')
      ? doc.createElementNS(SHOALBOOK_GPX_NS, name)
      : doc.createElementNS(GPX_NS, name);
    if (text !== undefined) child.appendChild(doc.createTextNode(text));
    parent.appendChild(child);
    return child;
  };
  const metadata = el(gpx, 'metadata');
  el(metadata, 'name', lakeName);
  el(metadata, 'time', exportedAt.toISOString());
  for (const f of finds) {
    // GPX 1.1 orders a waypoint's children: time, name, desc, type, extensions (after ele and before sym …).
    const wpt = el(gpx, 'wpt');
    wpt.setAttribute('lat', String(f.lat));
    wpt.setAttribute('lon', String(f.lon));
    if (f.markedAt) el(wpt, 'time', f.markedAt.toISOString());
    el(wpt, 'name', f.name);
    if (f.notes) el(wpt, 'desc', f.notes);
    el(wpt, 'type', f.kind);
    if (f.depthFt !== null || f.subKind) {
      const ext = el(wpt, 'extensions');
      // 1 ft = 0.3048 m exactly: six decimals of metres carry a depth in hundredths of a foot without loss.
      if (f.depthFt !== null) el(ext, 'sb:depth', String(Number(units.ftToM(f.depthFt).toFixed(6))));
      if (f.subKind) el(ext, 'sb:subKind', f.subKind);
    }
  }
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(doc)}\n`;
}
