import { ApiProperty } from '@nestjs/swagger';
import {
  HIT_RATE_GROUPINGS,
  type HitRateGroupingKey,
  type HitRateGroupView,
  type HitRatesView,
} from '@shoalbook/shared';
import { RateDto } from './rate-view.dto';

const count = { type: 'integer', minimum: 0 } as const;

export class HitRateGroupViewDto implements HitRateGroupView {
  @ApiProperty({ type: String, nullable: true, description: 'null = not recorded (no depth, no hardness grade …)' })
  key: string | null;
  @ApiProperty() label: string;
  @ApiProperty(count) finds: number;
  @ApiProperty(count) findsFished: number;
  @ApiProperty(count) findsProducing: number;
  @ApiProperty(count) findsWeighed: number;
  @ApiProperty(count) fishCount: number;
  @ApiProperty(count) weighedCount: number;
  @ApiProperty({ minimum: 0, description: 'lb' }) weightLb: number;
  @ApiProperty({
    type: RateDto,
    description: 'finds with a fish / finds fished; for the catch groupings the share of the fish',
  })
  producing: RateDto;
  @ApiProperty({ type: RateDto }) weighed: RateDto;
  @ApiProperty({ type: RateDto }) shareOfFish: RateDto;
  @ApiProperty({
    ...count,
    description:
      'whole seconds of stops: on the finds of the group (find groupings), or of every stop within the period or band (catch groupings)',
  })
  secondsFished: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'fish per hour fished (stops with a leaving time); null without timed stops',
  })
  fishPerHour: number | null;
  @ApiProperty({ type: 'integer', minimum: 1, description: '1 = best by the shrunk rate' }) rank: number;
}

export class HitRatesOverallDto {
  @ApiProperty(count) finds: number;
  @ApiProperty(count) findsFished: number;
  @ApiProperty(count) findsProducing: number;
  @ApiProperty(count) fishCount: number;
  @ApiProperty({ ...count, description: 'of fishCount, fish in a counted bag' }) countedCount: number;
  @ApiProperty({ minimum: 0, description: 'lb' }) weightLb: number;
  @ApiProperty({ type: RateDto }) producing: RateDto;
  @ApiProperty(count) secondsFished: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'fish per hour fished (stops with a leaving time); null without timed stops',
  })
  fishPerHour: number | null;
}

export class HitRatesViewDto implements HitRatesView {
  @ApiProperty({ enum: HIT_RATE_GROUPINGS }) by: HitRateGroupingKey;
  @ApiProperty({ enum: ['find', 'catch'], description: 'what one trial is' }) unit: 'find' | 'catch';
  @ApiProperty({ type: [HitRateGroupViewDto] }) groups: HitRateGroupViewDto[];
  @ApiProperty({ type: HitRatesOverallDto }) overall: HitRatesOverallDto;
  @ApiProperty({ type: [String], description: 'plain-words readings' }) readings: string[];
  @ApiProperty({ ...count, description: 'events the figures cover' }) eventCount: number;
  @ApiProperty({
    ...count,
    description: 'events with catches but no stops: their fished counts are derived from the catches',
  })
  derivedEvents: number;
}
