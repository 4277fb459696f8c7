/** First retry after about this long; each later one waits up to twice as long… */
export const BACKOFF_BASE_MS = 2_000;
/** …but never more than this (a boat comes back into signal within minutes, not hours). */
export const BACKOFF_CAP_MS = 5 * 60_000;

/**
 * Delay before retry number `attempt` (1 = first retry): exponential backoff with "full jitter", a uniformly
 * random wait between 0 and min(cap, base·2^(attempt−1)) (common practice; described in the AWS Architecture
 * Blog's "Exponential Backoff And Jitter", 2015). The jitter keeps phones that regain signal together from
 * retrying in step. `random` is Math.random unless a test passes its own.
 */
export function retryDelay(attempt: number, random: () => number = Math.random): number {
  const ceiling = Math.min(BACKOFF_CAP_MS, BACKOFF_BASE_MS * 2 ** Math.max(0, attempt - 1));
  return Math.floor(random() * ceiling);
}
