import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import type { UpdateCompetitionDayRequest, UpdatePracticeDayRequest } from '@shoalbook/shared';
import { IsInt, IsObject, IsOptional, IsString, Matches, MaxLength, Min, ValidateNested } from 'class-validator';
import { EnteredTemperatureDto } from '../../measurements/entered-value.dto';
import { InRange, RANGES } from '../../measurements/ranges';
import { IsOmittable } from '../../common/dto/omittable';
import { NoControlCharacters } from '../../common/dto/no-control-characters';

const HHMM = /^([01]\d|2[0-3]):[0-5]\d$/;

export class UpdatePracticeDayDto implements UpdatePracticeDayRequest {
  @ApiPropertyOptional({ maxLength: 5000 })
  @IsOmittable()
  @IsString()
  @NoControlCharacters({ multiline: true })
  @MaxLength(5000)
  notes?: string;
  @ApiPropertyOptional({
    nullable: true,
    description: '°F',
    minimum: RANGES.waterTempF.min,
    maximum: RANGES.waterTempF.max,
  })
  @IsOptional()
  @InRange(RANGES.waterTempF)
  waterTempF?: number | null;
  @ApiPropertyOptional({ type: EnteredTemperatureDto, nullable: true })
  @IsOptional()
  @IsObject()
  @ValidateNested()
  @Type(() => EnteredTemperatureDto)
  waterTemp?: EnteredTemperatureDto | null;
  @ApiProperty() @IsInt() @Min(1) version: number;
}

export class UpdateCompetitionDayDto implements UpdateCompetitionDayRequest {
  @ApiPropertyOptional({ nullable: true, example: '06:30', description: 'lake-local HH:MM' })
  @IsOptional()
  @Matches(HHMM, { message: 'Write the time as HH:MM (24-hour).' })
  startTime?: string | null;
  @ApiPropertyOptional({ nullable: true, example: '15:00' })
  @IsOptional()
  @Matches(HHMM, { message: 'Write the time as HH:MM (24-hour).' })
  checkInTime?: string | null;
  @ApiPropertyOptional({ maxLength: 5000 })
  @IsOmittable()
  @IsString()
  @NoControlCharacters({ multiline: true })
  @MaxLength(5000)
  weatherNotes?: string;
  @ApiPropertyOptional({
    nullable: true,
    description: '°F',
    minimum: RANGES.waterTempF.min,
    maximum: RANGES.waterTempF.max,
  })
  @IsOptional()
  @InRange(RANGES.waterTempF)
  waterTempF?: number | null;
  @ApiPropertyOptional({ type: EnteredTemperatureDto, nullable: true })
  @IsOptional()
  @IsObject()
  @ValidateNested()
  @Type(() => EnteredTemperatureDto)
  waterTemp?: EnteredTemperatureDto | null;
  @ApiProperty() @IsInt() @Min(1) version: number;
}
