import { Command } from '@nestjs/cqrs';
import type { FindView } from '@shoalbook/shared';
import type { CrewAccess } from '../../crews/access/request-context';
import type { AddFindDto, UpdateFindDto } from '../dto/find.dto';

export class AddFindCommand extends Command<FindView> {
  constructor(
    readonly access: CrewAccess,
    readonly input: AddFindDto,
  ) {
    super();
  }
}

export class UpdateFindCommand extends Command<FindView> {
  constructor(
    readonly access: CrewAccess,
    readonly findId: string,
    readonly input: UpdateFindDto,
  ) {
    super();
  }
}

/** Catches attributed to the find keep their data and lose the attribution (each gets a CatchUpdated). */
export class DeleteFindCommand extends Command<void> {
  constructor(
    readonly access: CrewAccess,
    readonly findId: string,
  ) {
    super();
  }
}
