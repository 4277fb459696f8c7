import { ApiPropertyOptional } from '@nestjs/swagger';
import type { RecordWeighInRequest } from '@shoalbook/shared';
import { IsInt, IsNumber, IsOptional, Max, Min } from 'class-validator';
import { IsOmittable } from '../common/dto/omittable';

const finite = { allowNaN: false, allowInfinity: false };

/** The official figures as announced; each optional (null clears it), plus the version they are based on. */
export class RecordWeighInDto implements RecordWeighInRequest {
  @ApiPropertyOptional({ nullable: true, description: 'lb' })
  @IsOptional()
  @IsNumber(finite)
  @Min(0)
  @Max(200)
  grossLb?: number | null;
  @ApiPropertyOptional({ nullable: true, description: 'lb' })
  @IsOptional()
  @IsNumber(finite)
  @Min(0)
  @Max(200)
  penaltyLb?: number | null;
  @ApiPropertyOptional({ nullable: true, description: 'lb' })
  @IsOptional()
  @IsNumber(finite)
  @Min(0)
  @Max(200)
  officialLb?: number | null;
  @ApiPropertyOptional({ nullable: true }) @IsOptional() @IsInt() @Min(1) @Max(10_000) dayPlace?: number | null;
  @ApiPropertyOptional({ nullable: true, description: 'minutes late at check-in' })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(1440)
  lateMinutes?: number | null;
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
