import { ApiProperty } from '@nestjs/swagger';
import type { RecapEmailResult } from '@shoalbook/shared';

export class RecapEmailResultDto implements RecapEmailResult {
  @ApiProperty({ type: 'integer', minimum: 1, description: 'messages handed to the SMTP server' }) sent: number;
}
