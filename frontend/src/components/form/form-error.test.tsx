import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ApiRequestError } from '../../lib/api-client';
import { renderWithApp } from '../../testing/render';
import { FormError } from './form-error';

const refusal = (fieldErrors?: Record<string, string[]>) =>
  new ApiRequestError({
    statusCode: 400,
    error: 'Bad Request',
    message: fieldErrors ? 'Check these fields: startTime, checkInTime.' : 'The event was changed meanwhile.',
    fieldErrors,
  });

describe('FormError', () => {
  it('says how many fields need a look, without the API’s field names', () => {
    renderWithApp(<FormError error={refusal({ startTime: ['Write 06:15'], checkInTime: ['Write 15:00'] })} />);
    expect(screen.getByText(/2 fields need a look/)).toBeInTheDocument();
    expect(screen.queryByText(/startTime|checkInTime/)).not.toBeInTheDocument();
  });

  it('shows the server’s sentence when it names no field', () => {
    renderWithApp(<FormError error={refusal()} />);
    expect(screen.getByText('The event was changed meanwhile.')).toBeInTheDocument();
  });
});
