import { DriverException } from '@mikro-orm/core';
import { describe, expect, it } from 'vitest';
import { toApiError } from './api-exception.filter';

const socketError = (code: string, message: string) => Object.assign(new Error(message), { code, syscall: 'read' });

describe('toApiError: database faults', () => {
  it('answers 503 for a connection the server dropped, also when a COMMIT fails on the bare socket', () => {
    // The shape seen when MariaDB was killed with SIGKILL during a write (knex prefixes the statement).
    expect(toApiError(socketError('ECONNRESET', 'COMMIT; - read ECONNRESET'))).toMatchObject({
      statusCode: 503,
      code: 'db_unavailable',
    });
    const sqlError = Object.assign(new Error('socket has unexpectedly been closed'), {
      name: 'SqlError',
      code: 'ER_SOCKET_UNEXPECTED_CLOSE',
    });
    expect(toApiError(sqlError).statusCode).toBe(503);
    const lostTransaction = new DriverException(
      new Error('Transaction query already complete, run with DEBUG=knex:tx'),
    );
    expect(toApiError(lostTransaction).statusCode).toBe(503);
  });

  it('keeps 500 for other failures, even with a network-like code but no socket behind it', () => {
    expect(toApiError(Object.assign(new Error('odd'), { code: 'ECONNRESET' })).statusCode).toBe(500);
    expect(toApiError(new Error('a bug')).statusCode).toBe(500);
  });
});
