import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsArray, IsIn, IsInt, IsOptional, IsUUID, Matches, Max, Min, ArrayMaxSize } from 'class-validator';
import { HIT_RATE_GROUPINGS, type HitRateGroupingKey, SEASONS, type Season } from '@shoalbook/shared';

const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Filters common to the report routes; they select events by their first competition date (lake-local). */
export class ReportFiltersDto {
  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID()
  lakeId?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID()
  eventId?: string;

  @ApiPropertyOptional({ enum: SEASONS })
  @IsOptional()
  @IsIn(SEASONS)
  season?: Season;

  @ApiPropertyOptional({ minimum: 1900, maximum: 2200 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1900)
  @Max(2200)
  year?: number;

  @ApiPropertyOptional({ description: 'YYYY-MM-DD (first competition date on or after)' })
  @IsOptional()
  @Matches(DATE, { message: 'from must be a date YYYY-MM-DD' })
  from?: string;

  @ApiPropertyOptional({ description: 'YYYY-MM-DD (first competition date on or before)' })
  @IsOptional()
  @Matches(DATE, { message: 'to must be a date YYYY-MM-DD' })
  to?: string;
}

export class HitRatesQueryDto extends ReportFiltersDto {
  @ApiPropertyOptional({ enum: HIT_RATE_GROUPINGS, default: 'kind' })
  @IsOptional()
  @IsIn(HIT_RATE_GROUPINGS)
  by?: HitRateGroupingKey;
}

export class LakeComparisonQueryDto extends HitRatesQueryDto {
  @ApiPropertyOptional({ description: 'Comma-separated event ids (default: every event on the lake)' })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string'
      ? value
          .split(',')
          .map((s) => s.trim())
          .filter(Boolean)
      : value,
  )
  @IsArray()
  @ArrayMaxSize(50)
  @IsUUID('all', { each: true })
  eventIds?: string[];
}

export class FindMapQueryDto extends ReportFiltersDto {}

export class RecapEmailDto {
  @ApiProperty({
    type: [String],
    format: 'uuid',
    maxItems: 100,
    description: 'members of this crew to send the recap to',
  })
  @IsArray()
  @ArrayMaxSize(100)
  @IsUUID('all', { each: true })
  userIds: string[];
}
