import { clockOrDash } from '../../lib/lake-time';
import type { SkyContext } from '../../lib/journal-types';

/** The solunar period of a moment in one word, for a table cell and its filter: "Major", "Minor", "Outside" or "—" (no time). */
export function solunarWord(sky: SkyContext | null | undefined): string {
  if (!sky) return '—';
  if (!sky.period) return 'Outside';
  return sky.period.kind === 'major' ? 'Major' : 'Minor';
}

/** The period with its window on the lake's clock: "Major 06:55–08:55", or "Outside the periods". */
export function solunarText(sky: SkyContext | null | undefined, timeZone: string): string {
  if (!sky) return 'No time recorded';
  if (!sky.period) return 'Outside the solunar periods';
  return `${solunarWord(sky)} ${clockOrDash(sky.period.start, timeZone)}–${clockOrDash(sky.period.end, timeZone)}`;
}
