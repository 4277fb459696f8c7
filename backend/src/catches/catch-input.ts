import { nearestFind, units, weightLooksWrong } from '@shoalbook/analytics';
import { DEFAULT_ATTRIBUTION_RADIUS_M, isHhMm, localTimeOn, parseInstant } from '@shoalbook/shared';
import type { CompetitionDay } from '../events/competition-day.entity';
import type { FieldProblems } from '../journal/journal-errors';
import type { Lake } from '../lakes/lake.entity';
import {
  MeasurementError,
  resolveDepth,
  resolveLength,
  resolveTemperature,
  resolveWeight,
} from '../measurements/measurements';
import { assignMeasured, checkRange, RANGES, sentField } from '../measurements/ranges';
import type { Catch } from './catch.entity';
import { catchTimeProblem } from './catch-window';
import type { FindLookup, FindsInMemory } from './find-lookup';
import type { LogCatchDto, UpdateCatchDto } from './dto/catch.dto';

/** What checking a catch needs from the database. */
export interface CatchContext {
  lake: Lake;
  day: CompetitionDay;
  /** Finds of the lake. */
  finds: FindLookup;
  photoIds: (id: string) => Promise<boolean>;
}

/** What checking an import's rows needs: no day yet (each row names its date), and the lake's finds in memory. */
export type ImportCatchContext = Omit<CatchContext, 'day' | 'finds'> & { finds: FindsInMemory };

/**
 * Apply a log or update request to a catch. Problems go to `problems` beside the request's field
 * names; the caller throws them (or, in an import, reports them on the row).
 */
export async function applyCatchInput(
  ctx: CatchContext,
  c: Catch,
  input: LogCatchDto | UpdateCatchDto,
  problems: FieldProblems,
): Promise<void> {
  const { lake, day } = ctx;
  if (input.caughtAt !== undefined) {
    const at = isHhMm(input.caughtAt)
      ? localTimeOn(day.date, input.caughtAt, lake.timeZone)
      : parseInstant(input.caughtAt);
    const outside = at && catchTimeProblem(at, day, lake.timeZone);
    if (!at)
      problems.add(
        'caughtAt',
        'Give the time as HH:MM (lake time) or an ISO-8601 date-time with a zone; that local time must exist on the day.',
      );
    else if (outside) problems.add('caughtAt', outside);
    else c.caughtAt = at;
  }
  if (input.species !== undefined) c.species = input.species;
  if (input.fate !== undefined) c.fate = input.fate;
  if (input.lure !== undefined) c.lure = input.lure ?? '';
  if (input.technique !== undefined) c.technique = input.technique ?? '';
  if (input.notes !== undefined) c.notes = input.notes ?? '';

  try {
    const weight = resolveWeight(input.weightLb, input.weight);
    if (weight) {
      checkRange(problems, sentField(input, 'weightLb', 'weight'), RANGES.weightLb, weight.canonical);
      c.weightLb = weight.canonical;
      c.weightValue = weight.value;
      c.weightUnit = weight.unit;
      c.weightOunces = weight.ounces ?? null;
    } else if (c.weightLb === undefined) problems.add('weightLb', 'Give the weight (weightLb, or weight with a unit).');
    const length = resolveLength(input.lengthIn, input.length);
    checkRange(problems, sentField(input, 'lengthIn', 'length'), RANGES.lengthIn, length?.canonical);
    assignMeasured(c, 'lengthIn', 'length', length);
    const depth = resolveDepth(input.depthFt, input.depth);
    checkRange(problems, sentField(input, 'depthFt', 'depth'), RANGES.depthFt, depth?.canonical);
    assignMeasured(c, 'depthFt', 'depth', depth);
    const temp = resolveTemperature(input.waterTempF, input.waterTemp);
    checkRange(problems, sentField(input, 'waterTempF', 'waterTemp'), RANGES.waterTempF, temp?.canonical);
    assignMeasured(c, 'waterTempF', 'waterTemp', temp);
  } catch (e) {
    if (!(e instanceof MeasurementError)) throw e;
    problems.add(e.field, e.message);
  }

  if ((input.lat === undefined) !== (input.lon === undefined) || (input.lat === null) !== (input.lon === null)) {
    problems.add(input.lat === undefined || input.lat === null ? 'lat' : 'lon', 'Give both lat and lon, or neither.');
  } else if (input.lat !== undefined) {
    c.lat = input.lat;
    c.lon = input.lon!;
  }
  if (input.findId !== undefined) {
    if (input.findId === null) {
      c.findId = null;
      c.attributionDistanceM = null;
    } else if (!(await ctx.finds.byId(input.findId))) {
      // Another crew's find, another lake's, or none at all: the same answer, so nothing leaks.
      problems.add('findId', 'No such find on this lake in this crew.');
    } else {
      c.findId = input.findId;
      c.attributionDistanceM = null;
    }
  } else if (input.lat !== undefined && input.lat !== null && c.lat !== null && c.lon !== null) {
    const point = { lat: c.lat, lon: c.lon };
    const radiusM = input.radiusM ?? DEFAULT_ATTRIBUTION_RADIUS_M;
    const near = nearestFind(point, await ctx.finds.near(point, radiusM), radiusM);
    c.findId = near?.find.id ?? null;
    c.attributionDistanceM = near ? Math.round(near.distanceM * 10) / 10 : null;
  }

  if (input.photoId !== undefined) {
    if (input.photoId !== null && !(await ctx.photoIds(input.photoId)))
      problems.add('photoId', 'No such photo in this crew.');
    else c.photoId = input.photoId;
  }
  c.weightFlagged = flagWeight(c);
}

/** Relative weight far from 100 for the length (analytics weightLooksWrong): flag, never change. */
export function flagWeight(c: Catch): boolean {
  if (
    c.species === 'other' ||
    c.lengthIn === null ||
    c.lengthIn === undefined ||
    !(c.weightLb > 0) ||
    !(c.lengthIn > 0)
  )
    return false;
  return weightLooksWrong(c.species, units.inToMm(c.lengthIn), units.lbToKg(c.weightLb) * 1000) === true;
}
