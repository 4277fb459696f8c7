import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { ApiError } from '@shoalbook/shared';

/** OpenAPI schema of the one error shape. */
export class ApiErrorDto implements ApiError {
  @ApiProperty({ example: 400 }) statusCode: number;
  @ApiProperty({ example: 'Bad Request' }) error: string;
  @ApiProperty({ example: 'Check the field "email": Enter a valid e-mail address.' }) message: string;
  @ApiPropertyOptional({ example: 'validation_failed' }) code?: string;
  @ApiPropertyOptional({
    type: 'object',
    additionalProperties: { type: 'array', items: { type: 'string' } },
    example: { email: ['Enter a valid e-mail address.'] },
  })
  fieldErrors?: Record<string, string[]>;
  @ApiProperty({ format: 'uuid' }) requestId?: string;
}
