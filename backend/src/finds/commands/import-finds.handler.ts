import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { FindImportResult } from '@shoalbook/shared';
import { TournamentEvent } from '../../events/tournament-event.entity';
import { commitFindImport, previewFindImport } from '../../imports/find-import';
import { readGpxUpload } from '../../imports/read-upload';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { FieldProblems, unknownReference } from '../../journal/journal-errors';
import { Lake } from '../../lakes/lake.entity';
import { FIND_SUB_KINDS } from '@shoalbook/shared';
import { ImportFindsCommand } from './import-finds.command';

@CommandHandler(ImportFindsCommand)
export class ImportFindsHandler implements ICommandHandler<ImportFindsCommand> {
  constructor(private readonly journal: JournalEventsService) {}

  async execute({ access, file, options }: ImportFindsCommand): Promise<FindImportResult> {
    if (options.subKind && !FIND_SUB_KINDS[options.kind].includes(options.subKind)) {
      const p = new FieldProblems();
      p.add('subKind', `"${options.subKind}" is not a sub-kind of ${options.kind}.`);
      p.throwIfAny();
    }
    const waypoints = await readGpxUpload(file);
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const lake = await tx.findOne(Lake, { id: options.lakeId, crewId: access.crewId });
      if (!lake) throw unknownReference('lakeId', 'lake');
      const event = options.eventId
        ? await tx.findOne(TournamentEvent, { id: options.eventId, crewId: access.crewId, lakeId: lake.id })
        : null;
      if (options.eventId && !event) throw unknownReference('eventId', 'event on this lake');
      const preview = await previewFindImport(tx, access.crewId, lake, waypoints);
      const { imported, skipped } = await commitFindImport(tx, log, access.crewId, lake, waypoints, preview, {
        event,
        kind: options.kind,
        subKind: options.subKind,
        skipDuplicates: options.skipDuplicates,
        source: 'gpx',
      });
      const errors = preview.rows.filter((r) => r.error).map((r) => ({ index: r.index, message: r.error! }));
      return { imported, skipped, errors };
    });
  }
}
