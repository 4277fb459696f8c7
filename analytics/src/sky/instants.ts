import { parseInstant } from '@shoalbook/shared';

/**
 * An ISO-8601 instant (with `Z` or an offset) as epoch milliseconds.
 * @throws RangeError when the string is not such an instant
 */
export function instantMs(instant: string): number {
  const date = parseInstant(instant);
  if (!date) throw new RangeError(`instant must be an ISO-8601 string with Z or an offset, got ${String(instant)}`);
  return date.getTime();
}

/** Epoch milliseconds → ISO-8601 UTC string, rounded to the second (the models are not finer). */
export function toIsoUtc(ms: number): string {
  return new Date(Math.round(ms / 1000) * 1000).toISOString();
}
