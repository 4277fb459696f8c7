import type { LakeView } from '@shoalbook/shared';
import type { Lake } from './lake.entity';

/** A lake's reference point is not a find's position: every member sees it. */
export function lakeView(l: Lake): LakeView {
  return {
    id: l.id,
    name: l.name,
    region: l.region,
    timeZone: l.timeZone,
    lat: l.lat,
    lon: l.lon,
    areaAcres: l.areaAcres,
    notes: l.notes,
    version: l.version,
  };
}
