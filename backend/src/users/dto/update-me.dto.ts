import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsNotEmpty, IsObject, IsString, MaxLength, ValidateNested } from 'class-validator';
import { DEPTH_UNITS, LENGTH_UNITS, TEMPERATURE_UNITS, type UnitPreferences, WEIGHT_UNITS } from '@shoalbook/shared';
import { Trim } from '../../common/dto/common-transforms';
import { IsOmittable } from '../../common/dto/omittable';
import { NoControlCharacters } from '../../common/dto/no-control-characters';

/** Any subset of the unit preferences; the rest stay as they are. */
export class UpdateUnitsDto implements Partial<UnitPreferences> {
  @ApiPropertyOptional({ enum: WEIGHT_UNITS })
  @IsOmittable()
  @IsIn(WEIGHT_UNITS, { message: `Weight is one of ${WEIGHT_UNITS.join(', ')}.` })
  weight?: UnitPreferences['weight'];

  @ApiPropertyOptional({ enum: LENGTH_UNITS })
  @IsOmittable()
  @IsIn(LENGTH_UNITS, { message: `Length is one of ${LENGTH_UNITS.join(', ')}.` })
  length?: UnitPreferences['length'];

  @ApiPropertyOptional({ enum: DEPTH_UNITS })
  @IsOmittable()
  @IsIn(DEPTH_UNITS, { message: `Depth is one of ${DEPTH_UNITS.join(', ')}.` })
  depth?: UnitPreferences['depth'];

  @ApiPropertyOptional({ enum: TEMPERATURE_UNITS })
  @IsOmittable()
  @IsIn(TEMPERATURE_UNITS, { message: `Temperature is one of ${TEMPERATURE_UNITS.join(', ')}.` })
  temperature?: UnitPreferences['temperature'];
}

export class UpdateMeDto {
  @ApiPropertyOptional({ maxLength: 80 })
  @IsOmittable()
  @Trim()
  @NoControlCharacters()
  @IsString({ message: 'Enter a name.' })
  @IsNotEmpty({ message: 'Enter a name.' })
  @MaxLength(80, { message: 'Use at most 80 characters.' })
  displayName?: string;

  @ApiPropertyOptional({ type: UpdateUnitsDto })
  @IsOmittable()
  @IsObject()
  @ValidateNested()
  @Type(() => UpdateUnitsDto)
  units?: UpdateUnitsDto;
}
