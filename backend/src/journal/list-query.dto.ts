import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';

export const MAX_LIST_LIMIT = 10_000;

/** ?limit & ?offset for the big lists (finds, catches); the total is in the X-Total-Count header. */
export class ListPageDto {
  @ApiPropertyOptional({ minimum: 1, maximum: MAX_LIST_LIMIT, default: MAX_LIST_LIMIT })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(MAX_LIST_LIMIT)
  limit?: number;

  @ApiPropertyOptional({ minimum: 0, default: 0 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(0)
  offset?: number;
}
