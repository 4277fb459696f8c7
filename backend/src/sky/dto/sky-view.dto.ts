import { ApiProperty } from '@nestjs/swagger';
import type { SkyContext, SkyDayView } from '@shoalbook/shared';

const instant = { type: String, format: 'date-time', nullable: true } as const;
const PERIOD_KINDS = ['major', 'minor'];

export class SolunarPeriodDto {
  @ApiProperty({ enum: PERIOD_KINDS }) kind: 'major' | 'minor';
  @ApiProperty({ format: 'date-time' }) start: string;
  @ApiProperty({ format: 'date-time' }) end: string;
}

export class SolunarPeriodWithCentreDto extends SolunarPeriodDto {
  @ApiProperty({ format: 'date-time' }) centre: string;
}

/** Sun and moon around an instant (instants ISO-8601 UTC; `date` is the lake-local day). */
export class SkyContextDto implements SkyContext {
  @ApiProperty({ example: '2024-04-12' }) date: string;
  @ApiProperty(instant) sunrise: string | null;
  @ApiProperty(instant) sunset: string | null;
  @ApiProperty(instant) moonrise: string | null;
  @ApiProperty(instant) moonset: string | null;
  @ApiProperty({ description: '0 new, 0.25 first quarter, 0.5 full, 0.75 last quarter' }) moonPhase: number;
  @ApiProperty({ description: 'illuminated fraction 0–1' }) moonIllumination: number;
  @ApiProperty({ type: SolunarPeriodDto, nullable: true }) period: SolunarPeriodDto | null;
}

export class SkyDayViewDto implements SkyDayView {
  @ApiProperty({ example: '2024-04-12' }) date: string;
  @ApiProperty({ example: 'America/Chicago' }) timeZone: string;
  @ApiProperty(instant) sunrise: string | null;
  @ApiProperty(instant) sunset: string | null;
  @ApiProperty(instant) civilDawn: string | null;
  @ApiProperty(instant) civilDusk: string | null;
  @ApiProperty(instant) moonrise: string | null;
  @ApiProperty(instant) moonset: string | null;
  @ApiProperty() moonPhase: number;
  @ApiProperty() moonIllumination: number;
  @ApiProperty({ type: [SolunarPeriodWithCentreDto] }) periods: SolunarPeriodWithCentreDto[];
}
