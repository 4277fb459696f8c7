import { ApiExtraModels, ApiProperty, getSchemaPath } from '@nestjs/swagger';
import {
  HIT_RATE_GROUPINGS,
  SEASONS,
  type HitRateGroupingKey,
  type LakeComparisonView,
  type ReportEventRef,
  type Season,
} from '@shoalbook/shared';
import { RecapTotalsDto } from './event-recap-view.dto';
import { EventRateDto } from './rate-view.dto';

type Comparison = LakeComparisonView['comparisons'][number];
type ComparisonGroup = LakeComparisonView['groups'][number];

export class ReportLakeRefDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
}

export class ReportEventRefDto implements ReportEventRef {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({
    type: String,
    nullable: true,
    example: '2025-10-10',
    description: 'first competition date (lake-local)',
  })
  firstDate: string | null;
  @ApiProperty({ enum: SEASONS, nullable: true }) season: Season | null;
  @ApiProperty({ type: 'integer', nullable: true }) year: number | null;
  @ApiProperty({ description: 'catches but no stops: fished is derived from the catches, with no time fished' })
  derivedFromCatches: boolean;
}

@ApiExtraModels(EventRateDto)
export class ComparisonGroupDto implements ComparisonGroup {
  @ApiProperty({ type: String, nullable: true }) key: string | null;
  @ApiProperty() label: string;
  @ApiProperty({
    type: 'object',
    additionalProperties: { $ref: getSchemaPath(EventRateDto) },
    description: 'keyed by event id',
  })
  perEvent: Record<string, EventRateDto>;
}

const share = { minimum: -1, maximum: 1 } as const;

export class EventComparisonDto implements Comparison {
  @ApiProperty({ type: String, nullable: true }) key: string | null;
  @ApiProperty() label: string;
  @ApiProperty({ format: 'uuid', description: 'the later event' }) a: string;
  @ApiProperty({ format: 'uuid', description: 'the earlier event' }) b: string;
  @ApiProperty({
    type: Number,
    nullable: true,
    ...share,
    description: 'rate a − rate b; null when either was not fished',
  })
  difference: number | null;
  @ApiProperty({ ...share, description: 'Newcombe hybrid score interval' }) lower: number;
  @ApiProperty(share) upper: number;
  @ApiProperty({ minimum: 0, maximum: 1, description: 'Fisher exact, two-sided' }) pValue: number;
  @ApiProperty({ description: 'p < 0.05 and the interval excludes 0' }) moreThanChance: boolean;
  @ApiProperty() reading: string;
}

@ApiExtraModels(RecapTotalsDto)
export class LakeComparisonViewDto implements LakeComparisonView {
  @ApiProperty({ type: ReportLakeRefDto }) lake: ReportLakeRefDto;
  @ApiProperty({ enum: HIT_RATE_GROUPINGS }) by: HitRateGroupingKey;
  @ApiProperty({ type: [ReportEventRefDto], description: 'oldest first' }) events: ReportEventRefDto[];
  @ApiProperty({
    type: 'object',
    additionalProperties: { $ref: getSchemaPath(RecapTotalsDto) },
    description: 'keyed by event id: each event’s bags and its place against its field',
  })
  results: Record<string, RecapTotalsDto>;
  @ApiProperty({ type: [ComparisonGroupDto] }) groups: ComparisonGroupDto[];
  @ApiProperty({ type: [EventComparisonDto] }) comparisons: EventComparisonDto[];
}
