import { ApiProperty } from '@nestjs/swagger';
import { FATES, type Fate, type TimingCatch, type TimingView } from '@shoalbook/shared';

type HourFigures = TimingView['byHour'][number];

export class TimingCatchDto implements TimingCatch {
  @ApiProperty({ format: 'uuid' }) catchId: string;
  @ApiProperty({ format: 'date-time' }) caughtAt: string;
  @ApiProperty({
    type: 'integer',
    minimum: 0,
    maximum: 1439,
    description: 'minutes after local midnight (lake’s wall clock)',
  })
  localMinutes: number;
  @ApiProperty({
    type: 'integer',
    nullable: true,
    description: 'minutes after the day’s sunrise (negative before it); null when the sun does not rise',
  })
  minutesFromSunrise: number | null;
  @ApiProperty({ enum: ['major', 'minor'], nullable: true, description: 'null: in neither period' }) solunarPeriod:
    'major' | 'minor' | null;
  @ApiProperty({ description: 'lb' }) weightLb: number;
  @ApiProperty({ enum: FATES }) fate: Fate;
  @ApiProperty({ format: 'uuid' }) eventId: string;
  @ApiProperty({ example: '2025-10-10', description: 'the competition day (lake-local)' }) day: string;
}

export class HourFiguresDto implements HourFigures {
  @ApiProperty({ type: 'integer', minimum: 0, maximum: 23, description: 'local clock hour' }) hour: number;
  @ApiProperty({ type: 'integer', minimum: 0 }) fishCount: number;
  @ApiProperty({ minimum: 0, description: 'lb' }) weightLb: number;
}

export class TimingViewDto implements TimingView {
  @ApiProperty({
    type: [TimingCatchDto],
    description: 'at most 5,000 catches in time order, thinned evenly (first and last kept) when there are more',
  })
  catches: TimingCatchDto[];
  @ApiProperty({ type: 'integer', minimum: 0, description: 'every catch the filters select, before thinning' })
  totalCatches: number;
  @ApiProperty({ type: [HourFiguresDto], description: 'every catch, hours with a fish only' }) byHour: HourFiguresDto[];
}
