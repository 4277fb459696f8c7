import { ApiProperty } from '@nestjs/swagger';
import type { ProjectionRebuildResult } from '@shoalbook/shared';

export class ProjectionRebuildResultDto implements ProjectionRebuildResult {
  @ApiProperty({ type: 'integer', minimum: 0, description: 'journal events replayed' }) events: number;
  @ApiProperty({ type: 'integer', minimum: 0, description: 'ms' }) durationMs: number;
}
