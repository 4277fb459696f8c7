import { units } from '@shoalbook/analytics';
import type { WeightUnit } from '@shoalbook/shared';

/**
 * A canonical weight (lb) as a chart value in the user's unit: kilograms for 'kg', decimal pounds otherwise
 * (a chart axis cannot run in pounds-ounces; its tick labels still read as pounds). Exact factor from
 * @shoalbook/analytics units (1 lb = 0.45359237 kg, NIST SP 811).
 */
export function chartWeight(lb: number, unit: WeightUnit): number {
  return unit === 'kg' ? units.lbToKg(lb) : lb;
}

/** The sign shown on a weight axis. */
export function chartWeightSign(unit: WeightUnit): string {
  return unit === 'kg' ? 'kg' : 'lb';
}
