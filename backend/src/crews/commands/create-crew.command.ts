import { Command } from '@nestjs/cqrs';
import type { CrewView } from '@shoalbook/shared';

/** Create a crew; the creator becomes its first owner. */
export class CreateCrewCommand extends Command<CrewView> {
  constructor(
    readonly userId: string,
    readonly name: string,
  ) {
    super();
  }
}
