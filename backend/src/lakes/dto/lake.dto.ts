import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { type CreateLakeRequest, type LakeView, isIanaZone } from '@shoalbook/shared';
import {
  IsInt,
  IsNotEmpty,
  IsNumber,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  Validate,
  ValidatorConstraint,
  type ValidatorConstraintInterface,
} from 'class-validator';
import { Trim } from '../../common/dto/common-transforms';
import { NoControlCharacters } from '../../common/dto/no-control-characters';
import { FINITE } from '../../common/dto/finite-number';

@ValidatorConstraint({ name: 'ianaZone' })
export class IanaZoneConstraint implements ValidatorConstraintInterface {
  validate(value: unknown): boolean {
    return typeof value === 'string' && isIanaZone(value);
  }
  defaultMessage(): string {
    return 'Pick an IANA time zone such as "America/Chicago".';
  }
}

export class CreateLakeDto implements CreateLakeRequest {
  @ApiProperty({ maxLength: 120 })
  @Trim()
  @IsString()
  @NoControlCharacters()
  @IsNotEmpty()
  @MaxLength(120)
  name: string;
  @ApiPropertyOptional({ maxLength: 120 })
  @IsOptional()
  @Trim()
  @IsString()
  @NoControlCharacters()
  @MaxLength(120)
  region?: string;
  @ApiProperty({ example: 'America/Chicago' }) @IsString() @Validate(IanaZoneConstraint) timeZone: string;
  @ApiProperty({ minimum: -90, maximum: 90 }) @IsNumber(FINITE) @Min(-90) @Max(90) lat: number;
  @ApiProperty({ minimum: -180, maximum: 180 }) @IsNumber(FINITE) @Min(-180) @Max(180) lon: number;
  @ApiPropertyOptional({ nullable: true, minimum: 0 })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(0)
  @Max(10_000_000)
  areaAcres?: number | null;
  @ApiPropertyOptional({ maxLength: 5000 })
  @IsOptional()
  @IsString()
  @NoControlCharacters({ multiline: true })
  @MaxLength(5000)
  notes?: string;
}

/** Fields left out stay as they are; a null is checked, so a required field cannot be nulled (nullable ones say so themselves). */
export class UpdateLakeDto extends PartialType(CreateLakeDto, { skipNullProperties: false }) {
  @ApiProperty({ description: 'The version the change is based on; 409 "stale_version" when outdated.' })
  @IsInt()
  @Min(1)
  version: number;
}

export class LakeViewDto implements LakeView {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty() region: string;
  @ApiProperty() timeZone: string;
  @ApiProperty() lat: number;
  @ApiProperty() lon: number;
  @ApiProperty({ nullable: true, type: Number }) areaAcres: number | null;
  @ApiProperty() notes: string;
  @ApiProperty() version: number;
}
