import type { EventView, LakeView, UnitPreferences } from '@shoalbook/shared';
import { Heading, Text } from '@primer/react';
import { RulesCaution } from '../../../components/cautions/journal-cautions';
import { dayLabel } from '../../../lib/lake-time';
import { formatLength, formatWeight } from '../../../lib/units';
import styles from './event-summary.module.css';

const money = (n: number | null) =>
  n === null ? '—' : n.toLocaleString('en-US', { minimumFractionDigits: 0, maximumFractionDigits: 2 });

/** The event at a glance: where, when, under which rules, and how it ended. */
export function EventSummary({
  event,
  lake,
  prefs,
}: {
  event: EventView;
  lake: LakeView | undefined;
  prefs: UnitPreferences;
}) {
  const r = event.rules;
  return (
    <div className={styles.summary}>
      <section aria-labelledby="event-days">
        <Heading as="h2" id="event-days" className={styles.heading}>
          Days
        </Heading>
        <dl className={styles.grid}>
          <dt>Lake</dt>
          <dd>{lake ? `${lake.name} (${lake.timeZone.replace(/_/g, ' ')})` : '—'}</dd>
          <dt>Practice</dt>
          <dd>{event.practiceDates.length ? event.practiceDates.map(dayLabel).join(', ') : 'None recorded'}</dd>
          <dt>Competition</dt>
          <dd>{event.competitionDates.map(dayLabel).join(', ') || '—'}</dd>
          <dt>Organiser</dt>
          <dd>{event.organiser || '—'}</dd>
          <dt>Launch ramp</dt>
          <dd>{event.ramp ? `${event.ramp.lat.toFixed(5)}, ${event.ramp.lon.toFixed(5)}` : 'Not given'}</dd>
        </dl>
      </section>
      <section aria-labelledby="event-rules">
        <Heading as="h2" id="event-rules" className={styles.heading}>
          Rules
        </Heading>
        <dl className={styles.grid}>
          <dt>Fish counted per day</dt>
          <dd>{r.fishPerDay}</dd>
          <dt>Minimum length</dt>
          <dd>{r.minLengthIn === null ? 'None' : formatLength(r.minLengthIn, prefs.length)}</dd>
          <dt>Dead-fish penalty</dt>
          <dd>{formatWeight(r.deadFishPenaltyLb, prefs.weight)}</dd>
          <dt>Short-fish penalty</dt>
          <dd>{formatWeight(r.shortFishPenaltyLb, prefs.weight)}</dd>
          <dt>Late, per minute</dt>
          <dd>{formatWeight(r.latePenaltyLbPerMinute, prefs.weight)}</dd>
        </dl>
        <RulesCaution />
      </section>
      <section aria-labelledby="event-result">
        <Heading as="h2" id="event-result" className={styles.heading}>
          Result
        </Heading>
        <dl className={styles.grid}>
          <dt>Final place</dt>
          <dd>{event.finalPlace ?? 'Not yet'}</dd>
          <dt>Entry fee</dt>
          <dd>{money(event.entryFee)}</dd>
          <dt>Payout won</dt>
          <dd>{money(event.payout)}</dd>
        </dl>
        {event.notes ? <Text as="p">{event.notes}</Text> : null}
      </section>
    </div>
  );
}
