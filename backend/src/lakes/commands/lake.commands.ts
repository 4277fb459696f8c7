import { Command } from '@nestjs/cqrs';
import type { LakeView } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';
import type { CreateLakeDto, UpdateLakeDto } from '../dto/lake.dto';

export class CreateLakeCommand extends Command<LakeView> {
  constructor(
    readonly access: CrewAccess,
    readonly input: CreateLakeDto,
  ) {
    super();
  }
}

export class UpdateLakeCommand extends Command<LakeView> {
  constructor(
    readonly access: CrewAccess,
    readonly lakeId: string,
    readonly input: UpdateLakeDto,
  ) {
    super();
  }
}

/** Refused (409 "in_use") while the lake has events or finds. */
export class DeleteLakeCommand extends Command<void> {
  constructor(
    readonly access: CrewAccess,
    readonly lakeId: string,
  ) {
    super();
  }
}
