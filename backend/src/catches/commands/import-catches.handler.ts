import { HttpStatus } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { CatchImportResult } from '@shoalbook/shared';
import { ApiException } from '../../common/errors/api-errors';
import { insertRecordsBulk } from '../../imports/bulk-insert';
import { readCatchCsvUpload } from '../../imports/read-upload';
import { checkCatchRows } from '../../imports/catch-csv';
import { JournalEventsService } from '../../journal-events/journal-events.service';
import { JournalErrorCode, recordNotFound } from '../../journal/journal-errors';
import { CompetitionDay } from '../../events/competition-day.entity';
import { TournamentEvent } from '../../events/tournament-event.entity';
import { CatchesService } from '../catches.service';
import { ImportCatchesCommand } from './catch.commands';

/**
 * All rows or none: a catch CSV feeds the day's bag and standings, so half an import would give a
 * wrong weigh-in. Any row error refuses the whole file, listing every row's problems.
 */
@CommandHandler(ImportCatchesCommand)
export class ImportCatchesHandler implements ICommandHandler<ImportCatchesCommand> {
  constructor(
    private readonly journal: JournalEventsService,
    private readonly catches: CatchesService,
  ) {}

  async execute({ access, eventId, file }: ImportCatchesCommand): Promise<CatchImportResult> {
    const parsed = await readCatchCsvUpload(file);
    return this.journal.transaction(access.crewId, access.userId, async (tx, log) => {
      const event = await tx.findOne(TournamentEvent, { id: eventId, crewId: access.crewId });
      if (!event) throw recordNotFound('event');
      const days = await tx.find(CompetitionDay, { crewId: access.crewId, eventId });
      const ctx = await this.catches.lakeContext(tx, access.crewId, event);
      const existing = await this.catches.loggedCatchIdentities(tx, access.crewId, event.id);
      const rows = await checkCatchRows(access.crewId, event.id, days, ctx, parsed, existing);
      const bad = rows.filter((r) => r.preview.errors.length);
      if (bad.length) {
        const fieldErrors: Record<string, string[]> = {};
        for (const r of bad)
          for (const e of r.preview.errors) (fieldErrors[`line ${r.preview.line}: ${e.field}`] ??= []).push(e.message);
        throw new ApiException(
          HttpStatus.BAD_REQUEST,
          `${bad.length} of ${rows.length} row(s) have errors; nothing was imported. Fix them and import the file again.`,
          JournalErrorCode.importRefused,
          fieldErrors,
        );
      }
      // The one who imports the file logged its catches.
      const fresh = rows.filter((r) => !r.preview.duplicateOf);
      const records = fresh.map((r) => Object.assign(r.record!, { loggedBy: access.userId }));
      await insertRecordsBulk(tx, log, 'Catch', records, (c) => ({
        type: 'CatchLogged',
        aggregateType: 'catch',
        aggregateId: c.id,
      }));
      return { imported: records.length, skipped: rows.length - fresh.length, errors: [] };
    });
  }
}
