import { IsInt, IsString, Matches, Min } from 'class-validator';
import { describe, expect, it } from 'vitest';
import { ApiException } from '../errors/api-errors';
import { ApiValidationPipe, withoutFieldName } from './api-validation.pipe';

class SampleDto {
  @IsString() startTime: string;
  @Matches(/^\d{2}:\d{2}$/, { message: 'Write the time as 06:15 (24-hour clock).' }) checkInTime: string;
  @IsInt() @Min(1) fieldSize: number;
}

async function fieldErrorsOf(body: object): Promise<Record<string, string[]>> {
  try {
    await new ApiValidationPipe().transform(body, { type: 'body', metatype: SampleDto });
  } catch (e) {
    if (e instanceof ApiException) return (e.getResponse() as { fieldErrors: Record<string, string[]> }).fieldErrors;
    throw e;
  }
  throw new Error('no validation error');
}

describe('ApiValidationPipe field messages', () => {
  it('drop the API field name from class-validator’s own messages (they sit beside the field, under its label)', async () => {
    const errors = await fieldErrorsOf({ startTime: 615, checkInTime: '3pm', fieldSize: 0 });
    expect(errors.startTime).toEqual(['Must be a string']);
    expect(errors.checkInTime).toEqual(['Write the time as 06:15 (24-hour clock).']);
    expect(errors.fieldSize).toEqual(['Must not be less than 1']);
    expect(Object.values(errors).flat().join(' ')).not.toMatch(/startTime|fieldSize/);
  });

  it('leave a message that does not start with the field name as it is', () => {
    expect(withoutFieldName('The start is after check-in.', 'startTime')).toBe('The start is after check-in.');
    expect(withoutFieldName('startTimes are listed', 'startTime')).toBe('startTimes are listed');
  });
});
