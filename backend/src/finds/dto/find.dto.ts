import { ApiProperty, ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  FIND_KINDS,
  FOUND_HOW,
  FREQUENCY_KHZ,
  VEGETATION_DENSITIES,
  type AddFindRequest,
  type FindKind,
  type FoundHow,
  type HardnessGrade,
  type VegetationDensity,
} from '@shoalbook/shared';
import {
  IsBoolean,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { CLIENT_ID } from '../../common/dto/client-id';
import { Trim } from '../../common/dto/common-transforms';
import { EnteredDepthDto, EnteredTemperatureDto } from '../../measurements/entered-value.dto';
import { InRange, RANGES } from '../../measurements/ranges';
import { ListPageDto } from '../../journal/list-query.dto';
import { NoControlCharacters } from '../../common/dto/no-control-characters';
import { FINITE } from '../../common/dto/finite-number';

const INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:\d{2})$/;
const DATE = /^\d{4}-\d{2}-\d{2}$/;

export class AddFindDto implements AddFindRequest {
  @ApiPropertyOptional(CLIENT_ID) @IsOptional() @IsUUID('7') id?: string;
  @ApiProperty({ format: 'uuid' }) @IsUUID() lakeId: string;
  @ApiPropertyOptional({ format: 'uuid', nullable: true }) @IsOptional() @IsUUID() eventId?: string | null;
  @ApiPropertyOptional({ nullable: true, description: "One of the event's practice dates (YYYY-MM-DD)" })
  @IsOptional()
  @Matches(DATE, { message: 'Write the date as YYYY-MM-DD.' })
  practiceDate?: string | null;
  @ApiProperty({ maxLength: 120 })
  @Trim()
  @IsString()
  @NoControlCharacters()
  @IsNotEmpty()
  @MaxLength(120)
  name: string;
  @ApiPropertyOptional({ nullable: true, description: 'ISO-8601 instant with a zone' })
  @IsOptional()
  @Matches(INSTANT, { message: 'Give an ISO-8601 date-time with a zone, e.g. 2024-04-12T14:03:00Z.' })
  markedAt?: string | null;
  @ApiProperty({ minimum: -90, maximum: 90 }) @IsNumber(FINITE) @Min(-90) @Max(90) lat: number;
  @ApiProperty({ minimum: -180, maximum: 180 }) @IsNumber(FINITE) @Min(-180) @Max(180) lon: number;
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
  @ApiProperty({ enum: FIND_KINDS }) @IsIn([...FIND_KINDS]) kind: FindKind;
  @ApiPropertyOptional({ description: 'one of the sub-kinds of the kind (FIND_SUB_KINDS), or empty' })
  @IsOptional()
  @IsString()
  @NoControlCharacters()
  @MaxLength(40)
  subKind?: string;
  @ApiPropertyOptional({ nullable: true, minimum: 1, maximum: 5 })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(5)
  hardness?: HardnessGrade | null;
  @ApiPropertyOptional({ enum: VEGETATION_DENSITIES, nullable: true })
  @IsOptional()
  @IsIn([...VEGETATION_DENSITIES])
  vegetationDensity?: VegetationDensity | null;
  @ApiPropertyOptional() @IsOptional() @IsBoolean() baitSeen?: boolean;
  @ApiPropertyOptional({ nullable: true, minimum: 0 }) @IsOptional() @IsInt() @Min(0) @Max(10_000) fishMarked?:
    number | null;
  @ApiPropertyOptional({
    nullable: true,
    minimum: FREQUENCY_KHZ.min,
    maximum: FREQUENCY_KHZ.max,
    description: 'Sonar frequency in kHz: a lower one gives a wider cone, a higher one a narrower cone',
  })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(FREQUENCY_KHZ.min)
  @Max(FREQUENCY_KHZ.max)
  frequencyKhz?: number | null;
  @ApiPropertyOptional({ enum: FOUND_HOW, nullable: true })
  @IsOptional()
  @IsIn([...FOUND_HOW])
  foundHow?: FoundHow | null;
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
  @ApiPropertyOptional({ maxLength: 5000 })
  @IsOptional()
  @IsString()
  @NoControlCharacters({ multiline: true })
  @MaxLength(5000)
  notes?: string;
  @ApiPropertyOptional({ format: 'uuid', nullable: true }) @IsOptional() @IsUUID() photoId?: string | null;
}

/** Fields left out stay as they are; a null is checked, so a required field cannot be nulled (nullable ones say so themselves). */
export class UpdateFindDto extends PartialType(OmitType(AddFindDto, ['id', 'lakeId'] as const), {
  skipNullProperties: false,
}) {
  @ApiProperty() @IsInt() @Min(1) version: number;
}

export class FindListQueryDto extends ListPageDto {
  @ApiPropertyOptional({ format: 'uuid' }) @IsOptional() @IsUUID() lakeId?: string;
  @ApiPropertyOptional({ format: 'uuid' }) @IsOptional() @IsUUID() eventId?: string;
}
