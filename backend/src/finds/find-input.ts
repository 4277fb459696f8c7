import type { EntityManager } from '@mikro-orm/mariadb';
import { FIND_SUB_KINDS, localDateOf } from '@shoalbook/shared';
import { PracticeDay } from '../events/practice-day.entity';
import { TournamentEvent } from '../events/tournament-event.entity';
import { FieldProblems } from '../journal/journal-errors';
import type { Lake } from '../lakes/lake.entity';
import { MeasurementError, resolveDepth, resolveTemperature } from '../measurements/measurements';
import { assignMeasured, checkRange, RANGES, sentField } from '../measurements/ranges';
import { Photo } from '../photos/photo.entity';
import type { AddFindDto, UpdateFindDto } from './dto/find.dto';
import type { Find } from './find.entity';

const SIMPLE_FIELDS = [
  'name',
  'lat',
  'lon',
  'kind',
  'hardness',
  'vegetationDensity',
  'baitSeen',
  'fishMarked',
  'frequencyKhz',
  'foundHow',
  'notes',
] as const;

/**
 * Apply an add or update request to a find, checking everything that needs the database: the event
 * belongs to the crew and the same lake, the practice date is one of its practice days, the photo is
 * the crew's. All problems are reported together as field errors; nothing is written on error.
 */
export async function applyFindInput(
  tx: EntityManager,
  crewId: string,
  lake: Lake,
  find: Find,
  input: AddFindDto | UpdateFindDto,
): Promise<void> {
  const problems = new FieldProblems();
  for (const key of SIMPLE_FIELDS) {
    const value = input[key];
    if (value === undefined) continue;
    if (value === null && (key === 'notes' || key === 'baitSeen')) continue;
    (find as unknown as Record<string, unknown>)[key] = value;
  }
  if (input.subKind !== undefined) find.subKind = input.subKind ?? '';
  if (
    input.kind !== undefined &&
    input.subKind === undefined &&
    find.subKind &&
    !FIND_SUB_KINDS[find.kind].includes(find.subKind)
  )
    find.subKind = '';
  if (find.subKind && !FIND_SUB_KINDS[find.kind].includes(find.subKind)) {
    problems.add(
      'subKind',
      `"${find.subKind}" is not a sub-kind of ${find.kind}; pick one of: ${FIND_SUB_KINDS[find.kind].join(', ')}.`,
    );
  }
  if (input.markedAt !== undefined) find.markedAt = input.markedAt === null ? null : new Date(input.markedAt);
  if (find.markedAt && Number.isNaN(find.markedAt.getTime())) problems.add('markedAt', 'The date-time is not valid.');

  try {
    const depth = resolveDepth(input.depthFt, input.depth);
    checkRange(problems, sentField(input, 'depthFt', 'depth'), RANGES.depthFt, depth?.canonical);
    assignMeasured(find, 'depthFt', 'depth', depth);
    const temp = resolveTemperature(input.waterTempF, input.waterTemp);
    checkRange(problems, sentField(input, 'waterTempF', 'waterTemp'), RANGES.waterTempF, temp?.canonical);
    assignMeasured(find, 'waterTempF', 'waterTemp', temp);
  } catch (e) {
    if (!(e instanceof MeasurementError)) throw e;
    problems.add(e.field, e.message);
  }

  if (input.eventId !== undefined) {
    find.eventId = input.eventId;
    if (input.eventId === null) find.practiceDayId = null;
  }
  let event: TournamentEvent | null = null;
  if (find.eventId) {
    event = await tx.findOne(TournamentEvent, { id: find.eventId, crewId, lakeId: lake.id });
    if (!event) problems.add('eventId', 'No such event on this lake in this crew.');
  }
  if (event && (input.practiceDate !== undefined || input.eventId !== undefined || input.markedAt !== undefined)) {
    const wanted =
      input.practiceDate ??
      (input.practiceDate === null ? null : find.markedAt ? localDateOf(find.markedAt, lake.timeZone) : null);
    const day = wanted ? await tx.findOne(PracticeDay, { crewId, eventId: event.id, date: wanted }) : null;
    if (input.practiceDate && !day)
      problems.add(
        'practiceDate',
        `${input.practiceDate} is not one of the event's practice days (${event.practiceDates.join(', ') || 'none'}).`,
      );
    find.practiceDayId = day?.id ?? null;
  } else if (!event && input.practiceDate) {
    problems.add('practiceDate', 'A practice date needs an event.');
  }

  if (input.photoId !== undefined) {
    if (input.photoId !== null && !(await tx.count(Photo, { id: input.photoId, crewId })))
      problems.add('photoId', 'No such photo in this crew.');
    find.photoId = input.photoId;
  }
  problems.throwIfAny();
}
