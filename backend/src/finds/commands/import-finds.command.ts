import { Command } from '@nestjs/cqrs';
import type { FindImportResult, FindKind } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';

/** Import a GPX file's waypoints as finds: every accepted row, or (on any failure) none. */
export class ImportFindsCommand extends Command<FindImportResult> {
  constructor(
    readonly access: CrewAccess,
    readonly file: Buffer,
    readonly options: {
      lakeId: string;
      eventId: string | null;
      kind: FindKind;
      subKind: string;
      skipDuplicates: boolean;
    },
  ) {
    super();
  }
}
