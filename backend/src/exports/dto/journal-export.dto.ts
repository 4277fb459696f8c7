import { ApiProperty } from '@nestjs/swagger';
import type { JournalExport } from '@shoalbook/shared';
import { CatchViewDto } from '../../catches/dto/catch-view.dto';
import { CompetitionDayViewDto, EventViewDto, PracticeDayViewDto } from '../../events/dto/event-view.dto';
import { FindViewDto } from '../../finds/dto/find-view.dto';
import { LakeViewDto } from '../../lakes/dto/lake.dto';
import { RecordedWeighInDto } from '../../weigh-ins/weigh-in-view.dto';

export class ExportedEventDto extends EventViewDto {
  @ApiProperty({ type: [PracticeDayViewDto] }) practiceDays: PracticeDayViewDto[];
  @ApiProperty({ type: [CompetitionDayViewDto] }) competitionDays: CompetitionDayViewDto[];
  @ApiProperty({ type: [RecordedWeighInDto] }) weighIns: RecordedWeighInDto[];
}

/** The whole journal of a crew, exact positions included. */
export class JournalExportDto implements JournalExport {
  @ApiProperty({ enum: ['shoalbook-journal'] }) format: 'shoalbook-journal';
  @ApiProperty({ enum: [1] }) version: 1;
  @ApiProperty({ format: 'date-time' }) exportedAt: string;
  @ApiProperty({ format: 'uuid' }) crewId: string;
  @ApiProperty({ description: 'says the file holds exact positions' }) notice: string;
  @ApiProperty({ type: [LakeViewDto] }) lakes: LakeViewDto[];
  @ApiProperty({ type: [ExportedEventDto] }) events: ExportedEventDto[];
  @ApiProperty({ type: [FindViewDto] }) finds: FindViewDto[];
  @ApiProperty({ type: [CatchViewDto] }) catches: CatchViewDto[];
}
