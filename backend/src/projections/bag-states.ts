import type { EventRules } from '@shoalbook/shared';
import { bagOfDay } from '../weigh-ins/bag-rule';
import type { CatchRow } from './rows';

/** What counting a day reads of a catch row. */
export type BagStateCatch = Pick<
  CatchRow,
  'id' | 'caughtAtMs' | 'competitionDayId' | 'eventId' | 'findId' | 'weightLb' | 'lengthIn' | 'fate' | 'loggedBy' | 'bagState' | 'bagCounted'
>;

/**
 * Each catch's state under its day's bag rule (weigh-ins/bag-rule, the one the weigh-in screen uses), so the
 * "weighed" counts and weights of outcomes and statistics are the counted bag's, not a fate of its own. The
 * late penalty changes no fish's state, so it is left out here. Returns the catches whose state changed
 * (their rows are updated in place).
 */
export function countBagStates<C extends BagStateCatch>(
  catches: Iterable<C>,
  rulesOfEvent: (eventId: string) => EventRules | undefined,
): C[] {
  const byDay = new Map<string, C[]>();
  for (const c of catches) {
    const list = byDay.get(c.competitionDayId) ?? [];
    list.push(c);
    byDay.set(c.competitionDayId, list);
  }
  const changed: C[] = [];
  for (const list of byDay.values()) {
    // The weigh-in screen's order (time, then id): ties in the bag keep it.
    list.sort((a, b) => a.caughtAtMs - b.caughtAtMs || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
    const rules = rulesOfEvent(list[0]!.eventId);
    const verdicts = rules ? new Map(bagOfDay(list, rules, null).fish.map((v) => [v.catchId, v])) : new Map();
    for (const c of list) {
      const v = verdicts.get(c.id);
      const state = v?.state ?? '';
      const counted = v?.counted ?? false;
      if (c.bagState !== state || c.bagCounted !== counted) {
        c.bagState = state;
        c.bagCounted = counted;
        changed.push(c);
      }
    }
  }
  return changed;
}
