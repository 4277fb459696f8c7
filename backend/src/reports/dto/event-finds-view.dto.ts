import { ApiProperty } from '@nestjs/swagger';
import {
  FIND_KINDS,
  FIND_OUTCOMES,
  type EventFindsView,
  type FindKind,
  type FindOutcome,
  type PaidOffFindView,
} from '@shoalbook/shared';
import { RateDto } from './rate-view.dto';

const nullableNumber = { type: Number, nullable: true } as const;

export class PaidOffFindViewDto implements PaidOffFindView {
  @ApiProperty({ format: 'uuid' }) findId: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: FIND_KINDS }) kind: FindKind;
  @ApiProperty() subKind: string;
  @ApiProperty({ ...nullableNumber, description: 'feet' }) depthFt: number | null;
  @ApiProperty({ type: 'integer', nullable: true, minimum: 1, maximum: 5 }) hardness: number | null;
  @ApiProperty({ ...nullableNumber, description: '°F' }) waterTempF: number | null;
  @ApiProperty({ description: 'marked in this event’s practice (false: an older find that produced here)' })
  practiced: boolean;
  @ApiProperty() fished: boolean;
  @ApiProperty({
    type: 'integer',
    minimum: 0,
    description: 'stops on the find; derived from catches (one per day with a catch) where none were logged',
  })
  stopCount: number;
  @ApiProperty({ type: 'integer', nullable: true, minimum: 0, description: 'null when derived from catches' })
  minutesFished: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'fish per hour fished; null without timed stops' })
  fishPerHour: number | null;
  @ApiProperty({ type: 'integer', minimum: 0 }) fishCount: number;
  @ApiProperty({ type: 'integer', minimum: 0 }) weighedCount: number;
  @ApiProperty({ minimum: 0, description: 'lb' }) weightLb: number;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) firstBiteAt: string | null;
  @ApiProperty({ enum: FIND_OUTCOMES }) outcome: FindOutcome;
}

export class EventFindsViewDto implements EventFindsView {
  @ApiProperty({ type: [PaidOffFindViewDto] }) finds: PaidOffFindViewDto[];
  @ApiProperty({ type: RateDto, description: 'finds with a fish / finds fished' }) paidOff: RateDto;
  @ApiProperty({ description: 'catches but no stops: fished is derived from the catches, with no time fished' })
  derivedFromCatches: boolean;
}
