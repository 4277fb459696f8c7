import { ApiProperty, ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  EVENT_FORMATS,
  isCalendarDate,
  type CreateEventRequest,
  type EventFormat,
  type EventRules,
} from '@shoalbook/shared';
import {
  ArrayMaxSize,
  IsArray,
  IsInt,
  IsIn,
  IsNotEmpty,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
  Validate,
  ValidateNested,
  ValidatorConstraint,
  type ValidatorConstraintInterface,
} from 'class-validator';
import { Trim } from '../../common/dto/common-transforms';
import { IsOmittable } from '../../common/dto/omittable';
import { FieldContextDto } from './field-context.dto';
import { RampPositionDto } from './ramp-position.dto';
import { NoControlCharacters } from '../../common/dto/no-control-characters';
import { FINITE } from '../../common/dto/finite-number';

@ValidatorConstraint({ name: 'calendarDates' })
export class CalendarDatesConstraint implements ValidatorConstraintInterface {
  validate(value: unknown): boolean {
    return (
      Array.isArray(value) &&
      value.every((d) => typeof d === 'string' && isCalendarDate(d)) &&
      new Set(value).size === value.length
    );
  }
  defaultMessage(): string {
    return 'Give distinct calendar dates written YYYY-MM-DD.';
  }
}

/** The event's rules; every field optional on input, defaults are common practice (5 fish, 12 in). */
export class EventRulesDto implements Partial<EventRules> {
  @ApiPropertyOptional({ default: 5, minimum: 1, maximum: 10 })
  @IsOmittable()
  @IsInt()
  @Min(1)
  @Max(10)
  fishPerDay?: number;
  @ApiPropertyOptional({ default: 12, nullable: true, description: 'inches; null = no minimum' })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(0)
  @Max(30)
  minLengthIn?: number | null;
  @ApiPropertyOptional({ default: 0.25 }) @IsOmittable() @IsNumber(FINITE) @Min(0) @Max(20) deadFishPenaltyLb?: number;
  @ApiPropertyOptional({ default: 1 }) @IsOmittable() @IsNumber(FINITE) @Min(0) @Max(20) shortFishPenaltyLb?: number;
  @ApiPropertyOptional({ default: 1 })
  @IsOmittable()
  @IsNumber(FINITE)
  @Min(0)
  @Max(20)
  latePenaltyLbPerMinute?: number;
  @ApiPropertyOptional({
    enum: EVENT_FORMATS,
    default: 'team',
    description: 'team: one bag per boat from both anglers’ fish; individual: a bag per angler',
  })
  @IsOmittable()
  @IsIn([...EVENT_FORMATS], { message: 'The format must be team or individual.' })
  format?: EventFormat;
}

export class CreateEventDto implements CreateEventRequest {
  @ApiProperty({ format: 'uuid' }) @IsUUID() lakeId: string;
  @ApiProperty({ maxLength: 160 })
  @Trim()
  @IsString()
  @NoControlCharacters()
  @IsNotEmpty()
  @MaxLength(160)
  name: string;
  @ApiPropertyOptional({ maxLength: 160 })
  @IsOmittable()
  @Trim()
  @IsString()
  @NoControlCharacters()
  @MaxLength(160)
  organiser?: string;
  @ApiPropertyOptional({ type: [String], example: ['2024-04-10', '2024-04-11'] })
  @IsOmittable()
  @IsArray()
  @ArrayMaxSize(14)
  @Validate(CalendarDatesConstraint)
  practiceDates?: string[];
  @ApiProperty({ type: [String], example: ['2024-04-12', '2024-04-13'] })
  @IsArray()
  @ArrayMaxSize(7)
  @Validate(CalendarDatesConstraint)
  competitionDates: string[];
  @ApiPropertyOptional({ type: EventRulesDto })
  @IsOmittable()
  @IsObject()
  @ValidateNested()
  @Type(() => EventRulesDto)
  rules?: EventRulesDto;
  @ApiPropertyOptional({ nullable: true }) @IsOptional() @IsNumber(FINITE) @Min(0) @Max(10_000_000) entryFee?:
    number | null;
  @ApiPropertyOptional({ nullable: true }) @IsOptional() @IsNumber(FINITE) @Min(0) @Max(100_000_000) payout?:
    number | null;
  @ApiPropertyOptional({ nullable: true }) @IsOptional() @IsInt() @Min(1) @Max(10_000) finalPlace?: number | null;
  @ApiPropertyOptional({ type: FieldContextDto, description: 'the field from the results sheet' })
  @IsOmittable()
  @IsObject()
  @ValidateNested()
  @Type(() => FieldContextDto)
  field?: FieldContextDto;
  @ApiPropertyOptional({
    type: RampPositionDto,
    nullable: true,
    description: 'the launch and check-in ramp (both coordinates); null clears it',
  })
  @IsOptional()
  @IsObject({ message: 'The ramp is an object with lat and lon, or null.' })
  @ValidateNested()
  @Type(() => RampPositionDto)
  ramp?: RampPositionDto | null;
  @ApiPropertyOptional({ maxLength: 5000 })
  @IsOmittable()
  @IsString()
  @NoControlCharacters({ multiline: true })
  @MaxLength(5000)
  notes?: string;
}

/** Fields left out stay as they are; a null is checked, so a required field cannot be nulled (nullable ones say so themselves). */
export class UpdateEventDto extends PartialType(OmitType(CreateEventDto, ['lakeId'] as const), {
  skipNullProperties: false,
}) {
  @ApiProperty({ description: 'The version the change is based on' }) @IsInt() @Min(1) version: number;
}

export class EventListQueryDto {
  @ApiPropertyOptional({ format: 'uuid' }) @IsOptional() @IsUUID() lakeId?: string;
}
