import { Command } from '@nestjs/cqrs';
import type { CrewAccess } from '../../crews/access/request-context';
import type { RecordWeighInDto } from '../weigh-in.dto';
import type { VersionedWeighIn } from '../weigh-ins.service';

/** Record (create or replace the given fields of) a competition day's official weigh-in. */
export class RecordWeighInCommand extends Command<VersionedWeighIn & { competitionDayId: string }> {
  constructor(
    readonly access: CrewAccess,
    readonly dayId: string,
    readonly input: RecordWeighInDto,
  ) {
    super();
  }
}
