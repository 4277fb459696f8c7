import type { EntityManager } from '@mikro-orm/mariadb';
import { clockTime, isHhMm, localDateOf, localTimeOn, parseInstant } from '@shoalbook/shared';
import type { CompetitionDay } from '../events/competition-day.entity';
import type { FindLookup } from '../catches/find-lookup';
import { catchTimeProblem } from '../catches/catch-window';
import type { FieldProblems } from '../journal/journal-errors';
import type { Lake } from '../lakes/lake.entity';
import type { LogStopDto, UpdateStopDto } from './dto/stop.dto';
import { spansOverlap } from './stop-attribution';
import { Stop } from './stop.entity';

/** What checking a stop needs: its day and lake, and the lake's finds of the crew. */
export interface StopContext {
  lake: Lake;
  day: CompetitionDay;
  finds: FindLookup;
}

const TIME_HELP =
  'Give the time as HH:MM (lake time) or an ISO-8601 date-time with a zone; that local time must exist on the day.';

/** A stop time on its day: the instant, or a problem beside the field (outside the day's hours included). */
function timeOn(ctx: StopContext, field: 'arrivedAt' | 'leftAt', value: string, problems: FieldProblems): Date | null {
  const at = isHhMm(value) ? localTimeOn(ctx.day.date, value, ctx.lake.timeZone) : parseInstant(value);
  if (!at) {
    problems.add(field, TIME_HELP);
    return null;
  }
  // The day's hours (its date, from the start to check-in where recorded) are the same for stops as for catches.
  if (catchTimeProblem(at, ctx.day, ctx.lake.timeZone) !== null) {
    const hours =
      ctx.day.startTime || ctx.day.checkInTime
        ? ` (${ctx.day.startTime ?? 'midnight'} to ${ctx.day.checkInTime ?? 'midnight'})`
        : '';
    problems.add(
      field,
      `${localDateOf(at, ctx.lake.timeZone)} ${clockTime(at, ctx.lake.timeZone)} lies outside the competition day ${ctx.day.date}${hours}, lake time ${ctx.lake.timeZone}.`,
    );
    return null;
  }
  return at;
}

/**
 * Apply a log or update request to a stop. Problems go to `problems` beside the request's field names; nothing is
 * changed on the stop when there is any, so the caller can throw them without writing.
 */
export async function applyStopInput(
  ctx: StopContext,
  stop: Stop,
  input: LogStopDto | UpdateStopDto,
  problems: FieldProblems,
): Promise<void> {
  const arrivedAt =
    input.arrivedAt === undefined ? stop.arrivedAt : timeOn(ctx, 'arrivedAt', input.arrivedAt, problems);
  const leftAt =
    input.leftAt === undefined
      ? stop.leftAt
      : input.leftAt === null
        ? null
        : timeOn(ctx, 'leftAt', input.leftAt, problems);
  if (arrivedAt && leftAt && leftAt <= arrivedAt)
    problems.add('leftAt', 'The stop must end after it starts: leaving comes after arriving.');

  let findId = input.findId === undefined ? stop.findId : input.findId;
  if (findId && input.findId !== undefined && !(await ctx.finds.byId(findId))) {
    // Another crew's find, another lake's, or none at all: the same answer, so nothing leaks.
    problems.add('findId', 'No such find on this lake in this crew.');
    findId = null;
  }
  const latSent = input.lat !== undefined;
  const lonSent = input.lon !== undefined;
  if (latSent !== lonSent || (latSent && (input.lat === null) !== (input.lon === null)))
    problems.add(latSent && input.lat !== null ? 'lon' : 'lat', 'Give both lat and lon, or neither.');
  const lat = latSent ? (input.lat ?? null) : stop.lat;
  const lon = lonSent ? (input.lon ?? null) : stop.lon;
  if (
    !findId &&
    !problems.errors.findId &&
    !problems.errors.lat &&
    !problems.errors.lon &&
    (lat === null || lon === null)
  )
    problems.add('lat', 'A stop with no find needs its position: give lat and lon (or name the find).');

  if (!problems.empty) return;
  stop.arrivedAt = arrivedAt!;
  stop.leftAt = leftAt ?? null;
  stop.findId = findId ?? null;
  stop.lat = lat;
  stop.lon = lon;
  if (input.waterTempF !== undefined) stop.waterTempF = input.waterTempF ?? null;
  if (input.lure !== undefined) stop.lure = input.lure;
  if (input.technique !== undefined) stop.technique = input.technique;
  if (input.notes !== undefined) stop.notes = input.notes;
}

/**
 * The same angler's stop on the same day whose span shares an instant with `stop`'s, if any: one angler is in one
 * place at a time. The caller holds a lock on the day's row, so two requests cannot both slip in.
 */
export async function overlappingStop(tx: EntityManager, stop: Stop): Promise<Stop | null> {
  const others = await tx.find(
    Stop,
    {
      crewId: stop.crewId,
      competitionDayId: stop.competitionDayId,
      loggedById: stop.loggedById,
      id: { $ne: stop.id },
    },
    { orderBy: { arrivedAt: 'asc' } },
  );
  return others.find((o) => spansOverlap(o, stop)) ?? null;
}
