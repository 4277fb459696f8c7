import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { FieldContext } from '@shoalbook/shared';
import { IsInt, IsOptional, Max, Min } from 'class-validator';
import { InRange, RANGES } from '../../measurements/ranges';

/** The field an event was fished against, from the results sheet: each optional, null clears it. */
export class FieldContextDto implements Partial<FieldContext> {
  @ApiPropertyOptional({ nullable: true, minimum: 1, maximum: 10_000, description: 'boats or anglers in the field' })
  @IsOptional()
  @IsInt({ message: 'The field size must be a whole number of boats or anglers.' })
  @Min(1, { message: 'The field size must be at least 1.' })
  @Max(10_000, { message: 'The field size must be at most 10000.' })
  fieldSize?: number | null;
  @ApiPropertyOptional({ nullable: true, description: 'lb', minimum: RANGES.bagLb.min, maximum: RANGES.bagLb.max })
  @IsOptional()
  @InRange(RANGES.bagLb)
  winningLb?: number | null;
  @ApiPropertyOptional({ nullable: true, description: 'lb', minimum: RANGES.bagLb.min, maximum: RANGES.bagLb.max })
  @IsOptional()
  @InRange(RANGES.bagLb)
  cutLb?: number | null;
}

export class FieldContextViewDto implements FieldContext {
  @ApiProperty({ type: Number, nullable: true }) fieldSize: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'lb' }) winningLb: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'lb' }) cutLb: number | null;
}
