import { Command } from '@nestjs/cqrs';

/** Delete a crew and all its data; `confirmName` must equal the crew's name (owner only). */
export class DeleteCrewCommand extends Command<void> {
  constructor(
    readonly crewId: string,
    readonly confirmName: string,
  ) {
    super();
  }
}
