/**
 * The usual eight names of the moon's phase from the phase fraction (0 new, 0.25 first quarter,
 * 0.5 full, 0.75 last quarter; the convention of suncalc's getMoonIllumination). Each principal phase
 * owns the eighth of the cycle centred on it.
 */
export function moonPhaseName(phase: number): string {
  const names = [
    'New moon',
    'Waxing crescent',
    'First quarter',
    'Waxing gibbous',
    'Full moon',
    'Waning gibbous',
    'Last quarter',
    'Waning crescent',
  ];
  const wrapped = ((phase % 1) + 1) % 1;
  return names[Math.floor(wrapped * 8 + 0.5) % 8];
}
