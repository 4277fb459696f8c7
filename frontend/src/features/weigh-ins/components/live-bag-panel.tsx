import type { BagView, CatchView, EventRules, UnitPreferences } from '@shoalbook/shared';
import { Heading, Text, TextInput, FormControl } from '@primer/react';
import { useState } from 'react';
import { LiveBagCaution } from '../../../components/cautions/journal-cautions';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { entryToIn, formatLength, formatWeight, parseLength, UNIT_SIGNS } from '../../../lib/units';
import { useWeighIns } from '../api/weigh-ins-api';
import thumb from '../../../components/journal-forms/thumb.module.css';
import styles from './weigh-ins.module.css';

/** What a new fish must be to improve one bag, in words. */
function improveText(bag: BagView, rules: EventRules, prefs: UnitPreferences): string {
  const min = rules.minLengthIn !== null ? ` at least ${formatLength(rules.minLengthIn, prefs.length)} long` : '';
  if (bag.nextToCull === null)
    return `${bag.counted.length} of ${rules.fishPerDay} so far: any legal fish${min} improves the bag.`;
  return `A new fish must weigh more than ${formatWeight(bag.mustBeatLb, prefs.weight)}${min ? ` and be${min}` : ''} to improve the bag.`;
}

function OneBag({
  bag,
  catches,
  rules,
  prefs,
  title,
}: {
  bag: BagView;
  catches: Map<string, CatchView>;
  rules: EventRules;
  prefs: UnitPreferences;
  title: string | null;
}) {
  const w = (lb: number) => formatWeight(lb, prefs.weight);
  const smallest = bag.nextToCull ? catches.get(bag.nextToCull) : undefined;
  const shorts = bag.fish.filter((f) => f.state === 'short');
  return (
    <div role="group" aria-label={title ?? 'Current bag'}>
      {title ? (
        <Heading as="h4" className={styles.heading}>
          {title}
        </Heading>
      ) : null}
      <dl className={styles.figures}>
        <div>
          <dt>Counted fish</dt>
          <dd>
            {bag.counted.length} of {rules.fishPerDay}
          </dd>
        </div>
        <div>
          <dt>Net so far</dt>
          <dd className={styles.net}>{w(bag.netLb)}</dd>
        </div>
        <div>
          <dt>Smallest in the bag (next to cull)</dt>
          <dd>{smallest ? w(smallest.weightLb) : '—'}</dd>
        </div>
      </dl>
      <ul className={styles.bagList} aria-label="Counted fish, heaviest first">
        {bag.counted.map((id) => {
          const c = catches.get(id);
          const dead = bag.fish.find((f) => f.catchId === id)?.state === 'dead';
          return c ? (
            <li key={id} className={id === bag.nextToCull ? styles.nextToCull : undefined}>
              {w(c.weightLb)}
              {dead ? ' · dead fish' : ''}
              {id === bag.nextToCull ? ' · next to cull' : ''}
            </li>
          ) : null;
        })}
      </ul>
      <Text as="p" className={styles.improve}>
        {improveText(bag, rules, prefs)}
      </Text>
      {shorts.length ? (
        <Text as="p" role="alert" className={styles.warning}>
          {shorts.length === 1 ? 'A short fish is' : `${shorts.length} short fish are`} kept for the scale (under{' '}
          {formatLength(rules.minLengthIn, prefs.length)}): each costs {w(rules.shortFishPenaltyLb)} and never counts.
          Release it now if the event&rsquo;s rules allow.
        </Text>
      ) : null}
    </div>
  );
}

/** Checks a fish before it goes in the livewell: short, or what it does to the bag. */
function FishCheck({ bag, rules, prefs }: { bag: BagView | undefined; rules: EventRules; prefs: UnitPreferences }) {
  const [text, setText] = useState('');
  const parsed = text.trim() ? parseLength(text, prefs.length) : null;
  const inches = parsed && parsed.ok ? entryToIn(parsed.entry) : null;
  let message: string | null = null;
  let short = false;
  if (parsed && !parsed.ok) message = parsed.error;
  else if (inches !== null && rules.minLengthIn !== null && inches < rules.minLengthIn) {
    short = true;
    message = `Short fish: ${formatLength(inches, prefs.length)} is under the event's ${formatLength(rules.minLengthIn, prefs.length)} minimum. It never counts and costs ${formatWeight(rules.shortFishPenaltyLb, prefs.weight)} at the scale.`;
  } else if (inches !== null)
    message =
      bag && bag.nextToCull !== null
        ? `Legal length. It improves the bag if it weighs more than ${formatWeight(bag.mustBeatLb, prefs.weight)}.`
        : 'Legal length. The bag has room: keep it.';
  return (
    <FormControl>
      <FormControl.Label>Check a fish&rsquo;s length ({UNIT_SIGNS[prefs.length]})</FormControl.Label>
      <TextInput
        name="checkLength"
        inputMode="decimal"
        value={text}
        onChange={(e) => setText(e.target.value)}
        validationStatus={short || (parsed && !parsed.ok) ? 'error' : undefined}
      />
      {message ? (
        <FormControl.Validation variant={short || (parsed && !parsed.ok) ? 'error' : 'success'}>
          {message}
        </FormControl.Validation>
      ) : null}
    </FormControl>
  );
}

/**
 * The live bag of one competition day, from the weigh-in query (the server's one bag rule): the counted fish,
 * the smallest (next to cull), what a new fish must weigh to improve the bag, short-fish warnings and the
 * fish-care caution. Logging, editing or deleting a catch invalidates the weigh-ins, so it follows each catch.
 */
export function LiveBagPanel({
  crewId,
  eventId,
  dayId,
  rules,
  prefs,
}: {
  crewId: string;
  eventId: string;
  dayId: string;
  rules: EventRules;
  prefs: UnitPreferences;
}) {
  const weighIns = useWeighIns(crewId, eventId, { live: true });
  const body = () => {
    if (weighIns.isPending) return <LoadingState label="Counting the bag…" />;
    if (weighIns.isError) return <ErrorState error={weighIns.error} onRetry={() => weighIns.refetch()} />;
    const day = weighIns.data.days.find((d) => d.competitionDayId === dayId);
    if (!day) return <Text className={styles.muted}>No bag for this day.</Text>;
    const catches = new Map(day.catches.map((c) => [c.id, c]));
    const names = new Map(day.catches.flatMap((c) => (c.loggedBy ? [[c.loggedBy.userId, c.loggedBy.name]] : [])));
    const individual = day.computed.format === 'individual';
    return (
      <>
        {day.computed.bags.map((bag) => (
          <OneBag
            key={bag.anglerId ?? 'boat'}
            bag={bag}
            catches={catches}
            rules={rules}
            prefs={prefs}
            title={individual ? `${names.get(bag.anglerId ?? '') || 'Unassigned fish'}’s bag` : null}
          />
        ))}
        <FishCheck bag={individual ? undefined : day.computed.bags[0]} rules={rules} prefs={prefs} />
      </>
    );
  };
  return (
    <section aria-labelledby={`live-bag-${dayId}`} className={`${styles.live} ${thumb.thumb}`}>
      <Heading as="h3" id={`live-bag-${dayId}`} className={styles.heading}>
        Live bag
      </Heading>
      {body()}
      <LiveBagCaution />
    </section>
  );
}
