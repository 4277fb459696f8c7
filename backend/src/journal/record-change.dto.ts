import { ApiProperty } from '@nestjs/swagger';
import {
  CATCH_HISTORY_FIELDS,
  WEIGH_IN_HISTORY_FIELDS,
  type CatchHistoryField,
  type RecordChange,
  type WeighInHistoryField,
} from '@shoalbook/shared';

const nullableNumber = { type: Number, nullable: true } as const;

/** What every history entry has besides the field it is about. */
class RecordChangeBaseDto {
  @ApiProperty({ ...nullableNumber, description: 'the figure before (null on the first recording)' })
  from: number | null;
  @ApiProperty({ ...nullableNumber, description: 'the figure after' })
  to: number | null;
  @ApiProperty({ format: 'date-time', description: 'when the change was written (UTC)' })
  at: string;
  @ApiProperty({ type: String, nullable: true, description: 'display name of the member who made it' })
  byName: string | null;
  @ApiProperty({ description: "the record's first recording rather than a later change" })
  first: boolean;
}

export class CatchChangeDto extends RecordChangeBaseDto implements RecordChange<CatchHistoryField> {
  @ApiProperty({ enum: CATCH_HISTORY_FIELDS, description: 'weightLb in lb, lengthIn in inches' })
  field: CatchHistoryField;
}

export class WeighInChangeDto extends RecordChangeBaseDto implements RecordChange<WeighInHistoryField> {
  @ApiProperty({
    enum: WEIGH_IN_HISTORY_FIELDS,
    description: 'weights in lb; places, minutes and the field size as counts',
  })
  field: WeighInHistoryField;
}
