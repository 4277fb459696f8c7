import type { WeightUnit } from '@shoalbook/shared';
import { formatWeight } from '../../lib/units';

/** A signed difference in the user's unit: "−0.13 lb", "+0.02 lb", "no difference". */
export function signedWeight(lb: number, unit: WeightUnit): string {
  if (Math.abs(lb) < 0.005) return 'no difference';
  return `${lb < 0 ? '−' : '+'}${formatWeight(Math.abs(lb), unit)}`;
}

/**
 * An official figure beside Shoalbook's own, neither overwriting the other: "scale 17.62 lb, log 17.75 lb,
 * −0.13 lb". Without an official figure, the log's alone, unlabelled: "log" means something only beside "scale".
 */
export function officialBesideLog(official: number | null | undefined, log: number, unit: WeightUnit): string {
  if (official === null || official === undefined) return formatWeight(log, unit);
  return `scale ${formatWeight(official, unit)}, log ${formatWeight(log, unit)}, ${signedWeight(official - log, unit)}`;
}
