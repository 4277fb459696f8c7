import { LockMode } from '@mikro-orm/core';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { fieldError } from '../../common/errors/api-errors';
import { Crew } from '../crew.entity';
import { CrewRemovalService } from '../crew-removal.service';
import { DeleteCrewCommand } from './delete-crew.command';

/** The typed name must match exactly (after trimming): a deliberate act, never a slip of the finger. */
export function confirmationProblem(crewName: string, confirmName: string): string | null {
  return confirmName === crewName ? null : 'Type the crew’s name exactly as it is shown to confirm.';
}

@CommandHandler(DeleteCrewCommand)
export class DeleteCrewHandler implements ICommandHandler<DeleteCrewCommand> {
  constructor(private readonly removal: CrewRemovalService) {}

  async execute({ crewId, confirmName }: DeleteCrewCommand): Promise<void> {
    await this.removal.run(async (tx, purge) => {
      // Checked again on the locked row, so a rename racing the deletion cannot slip through.
      const crew = await tx.findOne(Crew, { id: crewId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
      const problem = crew ? confirmationProblem(crew.name, confirmName) : null;
      if (problem) throw fieldError('confirmName', problem);
      await purge(crewId);
    });
  }
}
