import { Command } from '@nestjs/cqrs';
import type { CatchImportResult, CatchView } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';
import type { LogCatchDto, UpdateCatchDto } from '../dto/catch.dto';

export class LogCatchCommand extends Command<CatchView> {
  constructor(
    readonly access: CrewAccess,
    readonly input: LogCatchDto,
  ) {
    super();
  }
}

export class UpdateCatchCommand extends Command<CatchView> {
  constructor(
    readonly access: CrewAccess,
    readonly catchId: string,
    readonly input: UpdateCatchDto,
  ) {
    super();
  }
}

export class DeleteCatchCommand extends Command<void> {
  constructor(
    readonly access: CrewAccess,
    readonly catchId: string,
  ) {
    super();
  }
}

/** Import a CSV of catches for one event: every row, or none when any row has an error. */
export class ImportCatchesCommand extends Command<CatchImportResult> {
  constructor(
    readonly access: CrewAccess,
    readonly eventId: string,
    readonly file: Buffer,
  ) {
    super();
  }
}
