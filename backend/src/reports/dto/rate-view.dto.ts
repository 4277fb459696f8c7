import { ApiProperty } from '@nestjs/swagger';
import type { EventRate, Rate } from '@shoalbook/shared';

const fraction = { minimum: 0, maximum: 1 } as const;

/** A proportion with its Wilson 95 % interval and its shrunk value (fractions 0–1). */
export class RateDto implements Rate {
  @ApiProperty({ type: 'integer', minimum: 0 }) successes: number;
  @ApiProperty({ type: 'integer', minimum: 0 }) trials: number;
  @ApiProperty({ type: Number, nullable: true, ...fraction, description: 'successes / trials; null when trials = 0' })
  rate: number | null;
  @ApiProperty({ ...fraction, description: 'Wilson 95 % interval' }) lower: number;
  @ApiProperty(fraction) upper: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    ...fraction,
    description: 'shrunk toward the rate over the groups shown; null without any trials at all',
  })
  shrunk: number | null;
}

export class EventRateDto extends RateDto implements EventRate {
  @ApiProperty({ type: 'integer', minimum: 0, description: '0 for the catch groupings' }) findsFished: number;
  @ApiProperty({ type: Number, nullable: true, description: 'fish per hour fished; null without timed stops' })
  fishPerHour: number | null;
}
