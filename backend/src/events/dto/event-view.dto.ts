import { ApiProperty } from '@nestjs/swagger';
import {
  EVENT_FORMATS,
  type CompetitionDayView,
  type EventFormat,
  type EventRules,
  type EventView,
  type PracticeDayView,
} from '@shoalbook/shared';
import { FieldContextViewDto } from './field-context.dto';
import { RampPositionViewDto } from './ramp-position.dto';
import { EnteredTemperatureDto } from '../../measurements/entered-value.dto';

/** The rules as stored (every field set; defaults are common practice). */
export class EventRulesViewDto implements EventRules {
  @ApiProperty() fishPerDay: number;
  @ApiProperty({ type: Number, nullable: true, description: 'inches; null = no minimum' }) minLengthIn: number | null;
  @ApiProperty({ description: 'lb' }) deadFishPenaltyLb: number;
  @ApiProperty({ description: 'lb' }) shortFishPenaltyLb: number;
  @ApiProperty({ description: 'lb per minute' }) latePenaltyLbPerMinute: number;
  @ApiProperty({ enum: EVENT_FORMATS, description: 'team: one bag per boat; individual: a bag per angler' })
  format: EventFormat;
}

export class EventViewDto implements EventView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) lakeId: string;
  @ApiProperty() name: string;
  @ApiProperty() organiser: string;
  @ApiProperty({ type: [String], description: 'lake-local YYYY-MM-DD' }) practiceDates: string[];
  @ApiProperty({ type: [String], description: 'lake-local YYYY-MM-DD' }) competitionDates: string[];
  @ApiProperty({ type: EventRulesViewDto }) rules: EventRulesViewDto;
  @ApiProperty({ type: Number, nullable: true }) entryFee: number | null;
  @ApiProperty({ type: Number, nullable: true }) payout: number | null;
  @ApiProperty({ type: Number, nullable: true }) finalPlace: number | null;
  @ApiProperty({ type: FieldContextViewDto }) field: FieldContextViewDto;
  @ApiProperty({ type: RampPositionViewDto, nullable: true, description: 'the launch and check-in ramp' })
  ramp: RampPositionViewDto | null;
  @ApiProperty() notes: string;
  @ApiProperty() version: number;
}

export class EnteredWaterTempViewDto {
  @ApiProperty({ type: EnteredTemperatureDto, nullable: true }) waterTemp: EnteredTemperatureDto | null;
}

export class PracticeDayViewDto implements PracticeDayView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) eventId: string;
  @ApiProperty({ example: '2024-04-10' }) date: string;
  @ApiProperty() notes: string;
  @ApiProperty({ type: Number, nullable: true, description: '°F' }) waterTempF: number | null;
  @ApiProperty({ type: EnteredWaterTempViewDto }) entered: EnteredWaterTempViewDto;
  @ApiProperty() version: number;
}

export class CompetitionDayViewDto implements CompetitionDayView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ format: 'uuid' }) eventId: string;
  @ApiProperty({ example: '2024-04-12' }) date: string;
  @ApiProperty({ type: String, nullable: true, example: '06:30', description: 'lake-local HH:MM' }) startTime:
    string | null;
  @ApiProperty({ type: String, nullable: true, example: '15:00' }) checkInTime: string | null;
  @ApiProperty() weatherNotes: string;
  @ApiProperty({ type: Number, nullable: true, description: '°F' }) waterTempF: number | null;
  @ApiProperty({ type: EnteredWaterTempViewDto }) entered: EnteredWaterTempViewDto;
  @ApiProperty() version: number;
}
