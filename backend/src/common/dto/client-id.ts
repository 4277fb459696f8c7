/**
 * Swagger text of the optional client-made record id: a UUID version 7 (RFC 9562 §5.7), made on the device so
 * a record entered offline has its id before it reaches the server.
 */
export const CLIENT_ID = {
  format: 'uuid',
  description:
    'Optional client-made id, a UUID version 7 (RFC 9562). 409 id_taken if a record already has it; send an Idempotency-Key to retry safely.',
} as const;
