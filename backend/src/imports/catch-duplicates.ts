import type { CatchDuplicateOf } from '@shoalbook/shared';

/** What makes two catches the same fish: the day, the minute, the species and the weight to the hundredth. */
export interface CatchIdentity {
  id: string | null;
  competitionDayId: string;
  caughtAt: Date;
  species: string;
  weightLb: number;
}

const MINUTE_MS = 60_000;

function keyOf(c: CatchIdentity): string {
  return [
    c.competitionDayId,
    Math.floor(c.caughtAt.getTime() / MINUTE_MS),
    c.species,
    Math.round(c.weightLb * 100),
  ].join('|');
}

/**
 * For each candidate (in file order), the catch already logged or the earlier line of the same file that it
 * repeats, or null. Our own rule: a second fish of the same species and weight in the same minute of the same
 * day is far likelier a second import of one line than a second fish.
 */
export function findCatchDuplicates(
  existing: readonly CatchIdentity[],
  candidates: readonly (CatchIdentity & { line: number })[],
): (CatchDuplicateOf | null)[] {
  const seen = new Map<string, CatchDuplicateOf>();
  for (const c of existing) seen.set(keyOf(c), { catchId: c.id });
  return candidates.map((c) => {
    const key = keyOf(c);
    const earlier = seen.get(key);
    if (earlier) return earlier;
    seen.set(key, { catchId: null, line: c.line });
    return null;
  });
}
