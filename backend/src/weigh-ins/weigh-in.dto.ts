import { ApiPropertyOptional } from '@nestjs/swagger';
import type { RecordWeighInRequest } from '@shoalbook/shared';
import { IsInt, IsOptional, Max, Min } from 'class-validator';
import { IsOmittable } from '../common/dto/omittable';
import { InRange, RANGES } from '../measurements/ranges';

/** The official figures as announced; each optional (null clears it), plus the version they are based on. */
export class RecordWeighInDto implements RecordWeighInRequest {
  @ApiPropertyOptional({ nullable: true, description: 'lb', minimum: RANGES.bagLb.min, maximum: RANGES.bagLb.max })
  @IsOptional()
  @InRange(RANGES.bagLb)
  grossLb?: number | null;
  @ApiPropertyOptional({ nullable: true, description: 'lb', minimum: RANGES.bagLb.min, maximum: RANGES.bagLb.max })
  @IsOptional()
  @InRange(RANGES.bagLb)
  penaltyLb?: number | null;
  @ApiPropertyOptional({ nullable: true, description: 'lb', minimum: RANGES.bagLb.min, maximum: RANGES.bagLb.max })
  @IsOptional()
  @InRange(RANGES.bagLb)
  officialLb?: number | null;
  @ApiPropertyOptional({ nullable: true }) @IsOptional() @IsInt() @Min(1) @Max(10_000) dayPlace?: number | null;
  @ApiPropertyOptional({ nullable: true, description: 'minutes late at check-in' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(1440)
  lateMinutes?: number | null;
  @ApiPropertyOptional({
    nullable: true,
    minimum: 1,
    maximum: 10_000,
    description: "the day's field size (boats or anglers)",
  })
  @IsOptional()
  @IsInt({ message: 'The field size must be a whole number of boats or anglers.' })
  @Min(1, { message: 'The field size must be at least 1.' })
  @Max(10_000, { message: 'The field size must be at most 10000.' })
  fieldSize?: number | null;
  @ApiPropertyOptional({
    nullable: true,
    description: "the day's winning weight, lb",
    minimum: RANGES.bagLb.min,
    maximum: RANGES.bagLb.max,
  })
  @IsOptional()
  @InRange(RANGES.bagLb)
  winningLb?: number | null;
  @ApiPropertyOptional({
    nullable: true,
    description: "the day's cut weight, lb",
    minimum: RANGES.bagLb.min,
    maximum: RANGES.bagLb.max,
  })
  @IsOptional()
  @InRange(RANGES.bagLb)
  cutLb?: number | null;
  @ApiPropertyOptional({
    minimum: 1,
    description:
      'The version of the recorded weigh-in the change is based on; omit it only for the first recording. 409 "stale_version" when outdated.',
  })
  @IsOmittable()
  @IsInt()
  @Min(1)
  version?: number;
}
