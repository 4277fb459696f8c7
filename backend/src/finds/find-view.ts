import type { EnteredDepth, EnteredTemperature, FindView, HardnessGrade, SkyContext } from '@shoalbook/shared';
import { enteredOf } from '../measurements/measurements';
import type { Find } from './find.entity';

export interface FindViewContext {
  showPositions: boolean;
  practiceDate: string | null;
  sky: SkyContext | null;
}

export function findView(f: Find, ctx: FindViewContext): FindView {
  return {
    id: f.id,
    lakeId: f.lakeId,
    eventId: f.eventId,
    practiceDate: ctx.practiceDate,
    name: f.name,
    markedAt: f.markedAt ? f.markedAt.toISOString() : null,
    lat: ctx.showPositions ? f.lat : null,
    lon: ctx.showPositions ? f.lon : null,
    depthFt: f.depthFt,
    kind: f.kind,
    subKind: f.subKind,
    hardness: f.hardness as HardnessGrade | null,
    vegetationDensity: f.vegetationDensity,
    baitSeen: f.baitSeen,
    fishMarked: f.fishMarked,
    frequencyKhz: f.frequencyKhz,
    foundHow: f.foundHow,
    waterTempF: f.waterTempF,
    notes: f.notes,
    photoId: f.photoId,
    source: f.source,
    entered: {
      depth: enteredOf<EnteredDepth['unit']>(f.depthValue, f.depthUnit),
      waterTemp: enteredOf<EnteredTemperature['unit']>(f.waterTempValue, f.waterTempUnit),
    },
    sky: ctx.sky,
    version: f.version,
  };
}
