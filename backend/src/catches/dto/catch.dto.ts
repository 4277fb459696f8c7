import { ApiProperty, ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { FATES, SPECIES, type Fate, type LogCatchRequest, type Species } from '@shoalbook/shared';
import {
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import {
  EnteredDepthDto,
  EnteredLengthDto,
  EnteredTemperatureDto,
  EnteredWeightDto,
} from '../../measurements/entered-value.dto';
import { ListPageDto } from '../../journal/list-query.dto';
import { CLIENT_ID } from '../../common/dto/client-id';
import { IsOmittable } from '../../common/dto/omittable';
import { InRange, RANGES } from '../../measurements/ranges';
import { NoControlCharacters } from '../../common/dto/no-control-characters';
import { FINITE } from '../../common/dto/finite-number';

export class LogCatchDto implements LogCatchRequest {
  @ApiPropertyOptional(CLIENT_ID) @IsOptional() @IsUUID('7') id?: string;
  @ApiProperty({ format: 'uuid' }) @IsUUID() competitionDayId: string;
  @ApiProperty({ description: 'ISO-8601 instant, or "HH:MM" lake-local on the competition day', example: '09:42' })
  @IsString()
  @IsNotEmpty()
  @MaxLength(40)
  caughtAt: string;
  @ApiPropertyOptional({ format: 'uuid', nullable: true }) @IsOptional() @IsUUID() findId?: string | null;
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
  @ApiPropertyOptional({ default: 50, description: 'attribution radius, m' })
  @IsOmittable()
  @IsNumber(FINITE)
  @Min(1)
  @Max(1000)
  radiusM?: number;
  @ApiProperty({ enum: SPECIES }) @IsIn([...SPECIES]) species: Species;
  @ApiPropertyOptional({
    nullable: true,
    description: 'inches',
    minimum: RANGES.lengthIn.min,
    maximum: RANGES.lengthIn.max,
  })
  @IsOptional()
  @InRange(RANGES.lengthIn)
  lengthIn?: number | null;
  @ApiPropertyOptional({ type: EnteredLengthDto, nullable: true })
  @IsOptional()
  @IsObject()
  @ValidateNested()
  @Type(() => EnteredLengthDto)
  length?: EnteredLengthDto | null;
  @ApiPropertyOptional({
    description: 'decimal pounds (or give weight)',
    minimum: RANGES.weightLb.min,
    maximum: RANGES.weightLb.max,
  })
  @IsOmittable()
  @InRange(RANGES.weightLb)
  weightLb?: number;
  @ApiPropertyOptional({ type: EnteredWeightDto })
  @IsOmittable()
  @IsObject()
  @ValidateNested()
  @Type(() => EnteredWeightDto)
  weight?: EnteredWeightDto;
  @ApiPropertyOptional({ maxLength: 120 })
  @IsOptional()
  @IsString()
  @NoControlCharacters()
  @MaxLength(120)
  lure?: string;
  @ApiPropertyOptional({ maxLength: 120 })
  @IsOptional()
  @IsString()
  @NoControlCharacters()
  @MaxLength(120)
  technique?: string;
  @ApiPropertyOptional({
    nullable: true,
    description: 'feet',
    minimum: RANGES.depthFt.min,
    maximum: RANGES.depthFt.max,
  })
  @IsOptional()
  @InRange(RANGES.depthFt)
  depthFt?: number | null;
  @ApiPropertyOptional({ type: EnteredDepthDto, nullable: true })
  @IsOptional()
  @IsObject()
  @ValidateNested()
  @Type(() => EnteredDepthDto)
  depth?: EnteredDepthDto | null;
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
  @ApiProperty({ enum: FATES }) @IsIn([...FATES]) fate: Fate;
  @ApiPropertyOptional({ maxLength: 5000 })
  @IsOptional()
  @IsString()
  @NoControlCharacters({ multiline: true })
  @MaxLength(5000)
  notes?: string;
  @ApiPropertyOptional({ format: 'uuid', nullable: true }) @IsOptional() @IsUUID() photoId?: string | null;
}

/** Fields left out stay as they are; a null is checked, so a required field cannot be nulled (nullable ones say so themselves). */
export class UpdateCatchDto extends PartialType(OmitType(LogCatchDto, ['id', 'competitionDayId'] as const), {
  skipNullProperties: false,
}) {
  @ApiProperty() @IsInt() @Min(1) version: number;
}

export class CatchListQueryDto extends ListPageDto {
  @ApiPropertyOptional({ format: 'uuid' }) @IsOptional() @IsUUID() eventId?: string;
  @ApiPropertyOptional({ format: 'uuid' }) @IsOptional() @IsUUID() competitionDayId?: string;
}

export class CatchImportQueryDto {
  @ApiProperty({ format: 'uuid' }) @IsUUID() eventId: string;
}
