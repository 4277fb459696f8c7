import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { type BulkDeleteFindsResult, type BulkUpdateFindsResult, FIND_SUB_KINDS, localDateOf } from '@shoalbook/shared';
import type { EntityManager } from '@mikro-orm/mariadb';
import { PracticeDay } from '../../events/practice-day.entity';
import { TournamentEvent } from '../../events/tournament-event.entity';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { FieldProblems } from '../../journal/journal-errors';
import { Lake } from '../../lakes/lake.entity';
import { deleteFinds } from '../delete-finds';
import { Find } from '../find.entity';
import { BulkDeleteFindsCommand, BulkUpdateFindsCommand } from './bulk-finds.commands';

/** The chosen finds, all of them the crew's; a missing one refuses the whole request (400 naming findIds). */
async function loadAll(tx: EntityManager, crewId: string, ids: string[], problems: FieldProblems): Promise<Find[]> {
  const finds = await tx.find(Find, { crewId, id: { $in: ids } });
  if (finds.length !== ids.length)
    problems.add(
      'findIds',
      `${ids.length - finds.length} of the ${ids.length} finds are not in this crew (deleted meanwhile?); nothing was changed.`,
    );
  return finds;
}

@CommandHandler(BulkUpdateFindsCommand)
export class BulkUpdateFindsHandler implements ICommandHandler<BulkUpdateFindsCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, input }: BulkUpdateFindsCommand): Promise<BulkUpdateFindsResult> {
    const { kind, subKind, eventId } = input;
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const problems = new FieldProblems();
      if (kind === undefined && eventId === undefined)
        problems.add('kind', 'Say what to set: a kind, an event, or both.');
      if (subKind !== undefined && kind === undefined)
        problems.add('subKind', 'A sub-kind is set together with its kind.');
      if (kind && subKind && !FIND_SUB_KINDS[kind].includes(subKind))
        problems.add(
          'subKind',
          `"${subKind}" is not a sub-kind of ${kind}; pick one of: ${FIND_SUB_KINDS[kind].join(', ')}.`,
        );
      const finds = await loadAll(tx, access.crewId, input.findIds, problems);
      let event: TournamentEvent | null = null;
      if (eventId) {
        event = await tx.findOne(TournamentEvent, { id: eventId, crewId: access.crewId });
        if (!event) problems.add('eventId', 'No such event in this crew.');
        else {
          const elsewhere = finds.filter((f) => f.lakeId !== event!.lakeId).length;
          if (elsewhere) problems.add('eventId', `${elsewhere} of the finds are on another lake than the event.`);
        }
      }
      problems.throwIfAny();

      // A find joins the practice day of the event that its marking date falls on (lake time), as one by one.
      let practiceDayOf: (f: Find) => string | null = () => null;
      if (event) {
        const lake = await tx.findOneOrFail(Lake, { id: event.lakeId, crewId: access.crewId });
        const days = await tx.find(PracticeDay, { crewId: access.crewId, eventId: event.id });
        const byDate = new Map(days.map((d) => [d.date, d.id]));
        practiceDayOf = (f) => (f.markedAt ? (byDate.get(localDateOf(f.markedAt, lake.timeZone)) ?? null) : null);
      }
      for (const f of finds) {
        if (kind) {
          const keep = subKind ?? (FIND_SUB_KINDS[kind].includes(f.subKind) ? f.subKind : '');
          f.kind = kind;
          f.subKind = keep;
        }
        if (eventId !== undefined) {
          f.eventId = event?.id ?? null;
          f.practiceDayId = practiceDayOf(f);
        }
      }
      await tx.flush();
      for (const f of finds)
        log.record({
          type: 'FindUpdated',
          aggregateType: 'find',
          aggregateId: f.id,
          payload: recordState(tx, 'Find', f),
        });
      return { updated: finds.length };
    });
  }
}

@CommandHandler(BulkDeleteFindsCommand)
export class BulkDeleteFindsHandler implements ICommandHandler<BulkDeleteFindsCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, findIds }: BulkDeleteFindsCommand): Promise<BulkDeleteFindsResult> {
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const problems = new FieldProblems();
      const finds = await loadAll(tx, access.crewId, findIds, problems);
      problems.throwIfAny();
      const detached = await deleteFinds(tx, log, access.crewId, finds);
      return { deleted: finds.length, ...detached };
    });
  }
}
