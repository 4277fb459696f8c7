import { ApiProperty } from '@nestjs/swagger';
import type { StopDeletedView, StopView } from '@shoalbook/shared';

const nullableNumber = { type: Number, nullable: true } as const;

export class StopLoggedByDto {
  @ApiProperty({ format: 'uuid' }) userId: string;
  @ApiProperty() displayName: string;
}

export class StopCatchToCheckDto {
  @ApiProperty({ format: 'uuid' }) catchId: string;
  @ApiProperty({ description: 'm from the stop’s find' }) distanceM: number;
}

/** A stop; lat/lon are null when positions are hidden from the caller. */
export class StopViewDto implements StopView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) eventId: string;
  @ApiProperty({ format: 'uuid' }) competitionDayId: string;
  @ApiProperty({ example: '2024-04-12' }) competitionDate: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'null = no find' }) findId: string | null;
  @ApiProperty({ type: String, nullable: true }) findName: string | null;
  @ApiProperty(nullableNumber) lat: number | null;
  @ApiProperty(nullableNumber) lon: number | null;
  @ApiProperty({ format: 'date-time' }) arrivedAt: string;
  @ApiProperty({ type: String, format: 'date-time', nullable: true, description: 'null while still there' })
  leftAt: string | null;
  @ApiProperty({ ...nullableNumber, description: 'whole minutes; null while still there' }) minutes: number | null;
  @ApiProperty({ ...nullableNumber, description: '°F' }) waterTempF: number | null;
  @ApiProperty() lure: string;
  @ApiProperty() technique: string;
  @ApiProperty() notes: string;
  @ApiProperty({ type: StopLoggedByDto, nullable: true }) loggedBy: StopLoggedByDto | null;
  @ApiProperty({ type: [String], description: 'catches whose time lies in the stop' }) catchIds: string[];
  @ApiProperty({
    type: [StopCatchToCheckDto],
    description: 'catches of the stop with a position beyond the attribution radius from its find',
  })
  catchesToCheck: StopCatchToCheckDto[];
  @ApiProperty() version: number;
}

export class StopDeletedViewDto implements StopDeletedView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ type: [String], description: 'catches that were in the stop: kept, now in no stop' })
  unattachedCatchIds: string[];
  @ApiProperty() message: string;
}
