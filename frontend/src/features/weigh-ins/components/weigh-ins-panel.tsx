import { SPECIES_LABELS, type EventRules, type UnitPreferences } from '@shoalbook/shared';
import { Details, Heading, Label, Text } from '@primer/react';
import { EmptyState, ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { clockTime, dayLabel } from '../../../lib/lake-time';
import type { WeighInDay } from '../../../lib/journal-types';
import { formatLength, formatWeight } from '../../../lib/units';
import { useWeighIns } from '../api/weigh-ins-api';
import { OfficialWeighInForm } from './official-weigh-in-form';
import styles from './weigh-ins.module.css';

type Standing = 'counted' | 'culled' | 'out';

function standingOf(day: WeighInDay, catchId: string): Standing {
  if (day.computed.counted.includes(catchId)) return 'counted';
  if (day.computed.culled.includes(catchId)) return 'culled';
  return 'out';
}

const STANDING_LABEL: Record<Standing, { text: string; variant: 'success' | 'secondary' | 'attention' }> = {
  counted: { text: 'Counted', variant: 'success' },
  culled: { text: 'Culled', variant: 'secondary' },
  out: { text: 'Not in the bag', variant: 'attention' },
};

/**
 * Each competition day's bag: which fish count (the heaviest legal ones up to the day's limit), which were
 * culled, gross, penalties and net; the official figures, once entered, override. Then the event's totals.
 */
export function WeighInsPanel({
  crewId,
  eventId,
  rules,
  prefs,
  timeZone,
  canWrite,
}: {
  crewId: string;
  eventId: string;
  rules: EventRules;
  prefs: UnitPreferences;
  timeZone: string;
  canWrite: boolean;
}) {
  const weighIns = useWeighIns(crewId, eventId);
  if (weighIns.isPending) return <LoadingState label="Counting the bags…" />;
  if (weighIns.isError) return <ErrorState error={weighIns.error} onRetry={() => weighIns.refetch()} />;
  const { days, totals } = weighIns.data;
  if (days.length === 0) {
    return (
      <EmptyState title="No competition days">
        Add competition days to the event; each gets its own weigh-in here.
      </EmptyState>
    );
  }
  const w = (lb: number | null | undefined) => formatWeight(lb, prefs.weight);
  return (
    <div className={styles.panel}>
      <section aria-labelledby="weigh-in-totals" className={styles.totals}>
        <Heading as="h3" id="weigh-in-totals" className={styles.heading}>
          Event totals
        </Heading>
        <dl className={styles.figures}>
          <div>
            <dt>Computed net</dt>
            <dd>{w(totals.computedNetLb)}</dd>
          </div>
          <div>
            <dt>Total, official figures where entered</dt>
            <dd>{w(totals.officialLb)}</dd>
          </div>
          <div>
            <dt>Final place</dt>
            <dd>{totals.finalPlace ?? 'Not yet'}</dd>
          </div>
        </dl>
      </section>
      {days.map((day) => (
        <section key={day.competitionDayId} aria-labelledby={`day-${day.competitionDayId}`} className={styles.day}>
          <Heading as="h3" id={`day-${day.competitionDayId}`} className={styles.heading}>
            {dayLabel(day.date)}
          </Heading>
          <div role="group" aria-label={`Bag of ${dayLabel(day.date)}`}>
            <dl className={styles.figures}>
              <div>
                <dt>Counted fish</dt>
                <dd>
                  {day.computed.counted.length} of {rules.fishPerDay}
                </dd>
              </div>
              <div>
                <dt>Gross</dt>
                <dd>{w(day.computed.grossLb)}</dd>
              </div>
              <div>
                <dt>Penalties</dt>
                <dd>{day.computed.penaltyLb > 0 ? `−${w(day.computed.penaltyLb)}` : w(0)}</dd>
              </div>
              <div>
                <dt>Net</dt>
                <dd className={styles.net}>{w(day.computed.netLb)}</dd>
              </div>
              {day.official ? (
                <div>
                  <dt>Official</dt>
                  <dd className={styles.net}>
                    {w(day.official.officialLb)}
                    {day.official.dayPlace ? `, place ${day.official.dayPlace}` : ''}
                  </dd>
                </div>
              ) : null}
            </dl>
          </div>
          {day.official ? (
            <Text as="p" size="small" className={styles.muted}>
              The official figures override the computed ones in the totals.
            </Text>
          ) : null}
          {day.catches.length ? (
            <div className={styles.tableScroll}>
              <table className={styles.table}>
                <caption className={styles.caption}>Fish of {dayLabel(day.date)}</caption>
                <thead>
                  <tr>
                    <th scope="col">Time</th>
                    <th scope="col">Species</th>
                    <th scope="col" className={styles.numeric}>
                      Weight
                    </th>
                    <th scope="col" className={styles.numeric}>
                      Length
                    </th>
                    <th scope="col">In the bag</th>
                  </tr>
                </thead>
                <tbody>
                  {[...day.catches]
                    .sort((a, b) => b.weightLb - a.weightLb)
                    .map((c) => {
                      const standing = STANDING_LABEL[standingOf(day, c.id)];
                      return (
                        <tr key={c.id}>
                          <td>{clockTime(c.caughtAt, timeZone)}</td>
                          <td>{SPECIES_LABELS[c.species]}</td>
                          <td className={styles.numeric}>{w(c.weightLb)}</td>
                          <td className={styles.numeric}>{formatLength(c.lengthIn, prefs.length)}</td>
                          <td>
                            <Label variant={standing.variant}>{standing.text}</Label>
                            {c.fate === 'dead' ? <Text size="small"> dead fish</Text> : null}
                          </td>
                        </tr>
                      );
                    })}
                </tbody>
              </table>
            </div>
          ) : (
            <Text as="p" className={styles.muted}>
              No fish logged for this day yet.
            </Text>
          )}
          {canWrite ? (
            <Details className={styles.details}>
              <Details.Summary>Enter the official figures</Details.Summary>
              <OfficialWeighInForm
                crewId={crewId}
                eventId={eventId}
                dayId={day.competitionDayId}
                official={day.official}
                prefs={prefs}
              />
            </Details>
          ) : null}
        </section>
      ))}
    </div>
  );
}
