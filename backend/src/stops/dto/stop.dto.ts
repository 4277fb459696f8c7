import { ApiProperty, ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import type { LogStopRequest } from '@shoalbook/shared';
import { IsInt, IsNotEmpty, IsNumber, IsOptional, IsString, IsUUID, Max, MaxLength, Min } from 'class-validator';
import { CLIENT_ID } from '../../common/dto/client-id';
import { NoControlCharacters } from '../../common/dto/no-control-characters';
import { IsOmittable } from '../../common/dto/omittable';
import { ListPageDto } from '../../journal/list-query.dto';
import { InRange, RANGES } from '../../measurements/ranges';
import { FINITE } from '../../common/dto/finite-number';

const TIME = {
  description: '"HH:MM" lake-local on the competition day, or an ISO-8601 instant with a zone',
  example: '07:15',
};

export class LogStopDto implements LogStopRequest {
  @ApiPropertyOptional(CLIENT_ID) @IsOptional() @IsUUID('7') id?: string;
  @ApiProperty({ format: 'uuid' }) @IsUUID() competitionDayId: string;
  @ApiPropertyOptional({ format: 'uuid', nullable: true, description: 'null = no find: give lat and lon' })
  @IsOptional()
  @IsUUID()
  findId?: string | null;
  @ApiPropertyOptional({ nullable: true, minimum: -90, maximum: 90 })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(-90)
  @Max(90)
  lat?: number | null;
  @ApiPropertyOptional({ nullable: true, minimum: -180, maximum: 180 })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(-180)
  @Max(180)
  lon?: number | null;
  @ApiProperty(TIME) @IsString() @IsNotEmpty() @MaxLength(40) arrivedAt: string;
  @ApiPropertyOptional({ ...TIME, nullable: true, description: `${TIME.description}; null while still there` })
  @IsOptional()
  @IsString()
  @IsNotEmpty()
  @MaxLength(40)
  leftAt?: string | null;
  @ApiPropertyOptional({
    nullable: true,
    description: '°F',
    minimum: RANGES.waterTempF.min,
    maximum: RANGES.waterTempF.max,
  })
  @IsOptional()
  @InRange(RANGES.waterTempF)
  waterTempF?: number | null;
  @ApiPropertyOptional({ maxLength: 120, description: 'default lure of the catches logged in the stop' })
  @IsOmittable()
  @IsString()
  @NoControlCharacters()
  @MaxLength(120)
  lure?: string;
  @ApiPropertyOptional({ maxLength: 120, description: 'default technique of the catches logged in the stop' })
  @IsOmittable()
  @IsString()
  @NoControlCharacters()
  @MaxLength(120)
  technique?: string;
  @ApiPropertyOptional({ maxLength: 5000 })
  @IsOmittable()
  @IsString()
  @NoControlCharacters({ multiline: true })
  @MaxLength(5000)
  notes?: string;
}

/** Fields left out stay as they are. */
export class UpdateStopDto extends PartialType(OmitType(LogStopDto, ['id', 'competitionDayId'] as const), {
  skipNullProperties: false,
}) {
  @ApiProperty() @IsInt() @Min(1) version: number;
}

export class StopListQueryDto extends ListPageDto {
  @ApiPropertyOptional({ format: 'uuid' }) @IsOptional() @IsUUID() eventId?: string;
  @ApiPropertyOptional({ format: 'uuid' }) @IsOptional() @IsUUID() competitionDayId?: string;
}
