import type { CatchView, EnteredDepth, EnteredLength, EnteredTemperature, SkyContext } from '@shoalbook/shared';
import { enteredOf, enteredWeightOf } from '../measurements/measurements';
import type { Catch } from './catch.entity';

export interface CatchViewContext {
  showPositions: boolean;
  competitionDate: string;
  findName: string | null;
  sky: SkyContext | null;
  /** The display name of the crew member in `loggedBy` (null when unknown). */
  loggedByName: string | null;
}

export function catchView(c: Catch, ctx: CatchViewContext): CatchView {
  return {
    id: c.id,
    eventId: c.eventId,
    competitionDayId: c.competitionDayId,
    competitionDate: ctx.competitionDate,
    caughtAt: c.caughtAt.toISOString(),
    findId: c.findId,
    findName: ctx.findName,
    attributionDistanceM: c.attributionDistanceM,
    lat: ctx.showPositions ? c.lat : null,
    lon: ctx.showPositions ? c.lon : null,
    species: c.species,
    lengthIn: c.lengthIn,
    weightLb: c.weightLb,
    lure: c.lure,
    technique: c.technique,
    depthFt: c.depthFt,
    waterTempF: c.waterTempF,
    fate: c.fate,
    notes: c.notes,
    photoId: c.photoId,
    weightFlagged: c.weightFlagged,
    loggedBy: c.loggedBy ? { userId: c.loggedBy, name: ctx.loggedByName ?? '' } : null,
    entered: {
      weight: enteredWeightOf(c.weightValue, c.weightUnit, c.weightOunces),
      length: enteredOf<EnteredLength['unit']>(c.lengthValue, c.lengthUnit),
      depth: enteredOf<EnteredDepth['unit']>(c.depthValue, c.depthUnit),
      waterTemp: enteredOf<EnteredTemperature['unit']>(c.waterTempValue, c.waterTempUnit),
    },
    sky: ctx.sky,
    version: c.version,
  };
}
