import { SPECIES_LABELS, type EventRules, type UnitPreferences } from '@shoalbook/shared';
import { Details, Heading, Text } from '@primer/react';
import { EmptyState, ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { WaitingEntries } from '../../../components/send-queue/waiting-entries';
import type { SendKind } from '../../../lib/device-db';
import { clockTime, dayLabel } from '../../../lib/lake-time';
import { formatLength, formatWeight } from '../../../lib/units';
import { penaltyItems } from '../../reports/components/bag-by-day';
import { useWeighIns } from '../api/weigh-ins-api';
import { officialBesideLog, signedWeight } from '../official-figures';
import { FishStateLabel } from './fish-state-label';
import { OfficialWeighInForm } from './official-weigh-in-form';
import { WeighInHistory } from './weigh-in-history';
import styles from './weigh-ins.module.css';

const WEIGH_IN_WRITES: SendKind[] = ['weigh-in'];

/**
 * Each competition day's bag by the one bag rule (computed on the server): every fish with its state, the
 * penalties itemised, gross, penalties and net; the official figures, once entered, beside Shoalbook's own with
 * the difference (neither overwrites the other), and the event totals.
 */
export function WeighInsPanel({
  userId,
  crewId,
  eventId,
  rules,
  prefs,
  timeZone,
  canWrite,
}: {
  userId: string;
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
            <dd>
              {w(totals.officialLb)}
              {Math.abs(totals.differenceLb) >= 0.005 ? ` (${signedWeight(totals.differenceLb, prefs.weight)})` : ''}
            </dd>
          </div>
          <div>
            <dt>Final place</dt>
            <dd>
              {totals.finalPlace ?? 'Not yet'}
              {totals.finalPlace && totals.field.fieldSize ? ` of ${totals.field.fieldSize}` : ''}
            </dd>
          </div>
          {totals.field.winningLb !== null ? (
            <div>
              <dt>Winning weight</dt>
              <dd>{w(totals.field.winningLb)}</dd>
            </div>
          ) : null}
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
                  {day.computed.counted.length} of {rules.fishPerDay * day.computed.bags.length}
                  {day.computed.format === 'individual' ? ` (${day.computed.bags.length} anglers)` : ''}
                </dd>
              </div>
              <div>
                <dt>Gross</dt>
                <dd>{officialBesideLog(day.official?.grossLb, day.computed.grossLb, prefs.weight)}</dd>
              </div>
              <div>
                <dt>Penalties</dt>
                <dd>{officialBesideLog(day.official?.penaltyLb, day.computed.penaltyLb, prefs.weight)}</dd>
              </div>
              <div>
                <dt>Net</dt>
                <dd className={styles.net}>
                  {officialBesideLog(day.official?.officialLb, day.computed.netLb, prefs.weight)}
                </dd>
              </div>
              {day.official?.dayPlace ? (
                <div>
                  <dt>Day place</dt>
                  <dd>
                    {day.official.dayPlace}
                    {day.official.fieldSize ? ` of ${day.official.fieldSize}` : ''}
                  </dd>
                </div>
              ) : null}
            </dl>
          </div>
          <Text as="p" size="small" className={styles.muted}>
            Penalties: {penaltyItems(day.computed.penalties, prefs)}.
            {day.official ? ' Official figures count in the totals; ours stay beside them.' : ''}
          </Text>
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
                    <th scope="col">Logged by</th>
                    <th scope="col">State</th>
                  </tr>
                </thead>
                <tbody>
                  {[...day.catches]
                    .sort((a, b) => b.weightLb - a.weightLb)
                    .map((c) => (
                      <tr key={c.id}>
                        <td>{clockTime(c.caughtAt, timeZone)}</td>
                        <td>{SPECIES_LABELS[c.species]}</td>
                        <td className={styles.numeric}>{w(c.weightLb)}</td>
                        <td className={styles.numeric}>{formatLength(c.lengthIn, prefs.length)}</td>
                        <td>{c.loggedBy?.name || '—'}</td>
                        <td>
                          <FishStateLabel verdict={day.computed.fish.find((f) => f.catchId === c.id)} />
                        </td>
                      </tr>
                    ))}
                </tbody>
              </table>
            </div>
          ) : (
            <Text as="p" className={styles.muted}>
              No fish logged for this day yet.
            </Text>
          )}
          {day.official ? (
            <Details className={styles.details}>
              <Details.Summary>Who changed the official figures, and when</Details.Summary>
              <WeighInHistory
                crewId={crewId}
                eventId={eventId}
                dayId={day.competitionDayId}
                date={day.date}
                prefs={prefs}
                timeZone={timeZone}
              />
            </Details>
          ) : null}
          <WaitingEntries userId={userId} crewId={crewId} scope={day.competitionDayId} kinds={WEIGH_IN_WRITES} />
          {canWrite ? (
            <Details className={styles.details}>
              <Details.Summary>Enter the official figures</Details.Summary>
              <OfficialWeighInForm
                userId={userId}
                crewId={crewId}
                dayId={day.competitionDayId}
                date={day.date}
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
