import { Command } from '@nestjs/cqrs';
import type { StopDeletedView, StopView } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';
import type { LogStopDto, UpdateStopDto } from '../dto/stop.dto';

export class LogStopCommand extends Command<StopView> {
  constructor(
    readonly access: CrewAccess,
    readonly input: LogStopDto,
  ) {
    super();
  }
}

export class UpdateStopCommand extends Command<StopView> {
  constructor(
    readonly access: CrewAccess,
    readonly stopId: string,
    readonly input: UpdateStopDto,
  ) {
    super();
  }
}

/** Delete a stop; its catches stay, in no stop. */
export class DeleteStopCommand extends Command<StopDeletedView> {
  constructor(
    readonly access: CrewAccess,
    readonly stopId: string,
  ) {
    super();
  }
}
