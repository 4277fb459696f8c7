import { Command } from '@nestjs/cqrs';
import type { OfficialWeighIn } from '@shoalbook/shared';
import type { CrewAccess } from '../../common/request-context';
import type { RecordWeighInDto } from '../weigh-in.dto';

/** Record (create or replace the given fields of) a competition day's official weigh-in. */
export class RecordWeighInCommand extends Command<OfficialWeighIn & { competitionDayId: string }> {
  constructor(
    readonly access: CrewAccess,
    readonly dayId: string,
    readonly input: RecordWeighInDto,
  ) {
    super();
  }
}
