import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  DEPTH_UNITS,
  LENGTH_UNITS,
  TEMPERATURE_UNITS,
  WEIGHT_UNITS,
  type DepthUnit,
  type LengthUnit,
  type TemperatureUnit,
  type WeightUnit,
} from '@shoalbook/shared';
import { IsIn, IsNumber, Max, Min, ValidateIf } from 'class-validator';
import { EnteredNumber } from './ranges';
import { FINITE } from '../common/dto/finite-number';

/** A weight as typed: `{value: 1.42, unit: 'kg'}` or `{value: 3, unit: 'lb-oz', ounces: 4}`. */
export class EnteredWeightDto {
  @ApiProperty({ description: 'The number typed (whole pounds for lb-oz)' })
  @EnteredNumber()
  @Min(0)
  value: number;

  @ApiProperty({ enum: WEIGHT_UNITS })
  @IsIn([...WEIGHT_UNITS])
  unit: WeightUnit;

  @ApiPropertyOptional({ description: "Ounces, only with unit 'lb-oz' (0 ≤ oz < 16)" })
  @ValidateIf((o: EnteredWeightDto) => o.unit === 'lb-oz' || o.ounces !== undefined)
  @IsNumber(FINITE)
  @Min(0)
  @Max(15.999999)
  ounces?: number;
}

export class EnteredLengthDto {
  @ApiProperty() @EnteredNumber() value: number;
  @ApiProperty({ enum: LENGTH_UNITS }) @IsIn([...LENGTH_UNITS]) unit: LengthUnit;
}

export class EnteredDepthDto {
  @ApiProperty() @EnteredNumber() value: number;
  @ApiProperty({ enum: DEPTH_UNITS }) @IsIn([...DEPTH_UNITS]) unit: DepthUnit;
}

export class EnteredTemperatureDto {
  @ApiProperty() @EnteredNumber() value: number;
  @ApiProperty({ enum: TEMPERATURE_UNITS }) @IsIn([...TEMPERATURE_UNITS]) unit: TemperatureUnit;
}
