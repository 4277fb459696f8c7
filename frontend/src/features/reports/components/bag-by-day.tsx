import { Button, Heading } from '@primer/react';
import { useState } from 'react';
import { FISH_STATE_LABELS, type BagPenaltyItem, type UnitPreferences } from '@shoalbook/shared';
import { clockOrDash, dayLabel } from '../../../lib/lake-time';
import { formatLength, formatWeight } from '../../../lib/units';
import { officialBesideLog } from '../../weigh-ins/official-figures';
import type { RecapDay, RecapFish } from '../api/report-types';
import styles from './reports.module.css';

function ordinalPlace(n: number | null | undefined): string {
  if (!n) return '—';
  const teen = n % 100 >= 11 && n % 100 <= 13;
  return `${n}${teen ? 'th' : n % 10 === 1 ? 'st' : n % 10 === 2 ? 'nd' : n % 10 === 3 ? 'rd' : 'th'}`;
}

/** The itemised penalties: "dead fish 0.25 lb · short fish 1.00 lb · 2 min late 2.00 lb". */
export function penaltyItems(items: readonly BagPenaltyItem[], units: UnitPreferences): string {
  if (!items.length) return 'none';
  return items
    .map((p) =>
      p.kind === 'late'
        ? `${p.minutes ?? 0} min late ${formatWeight(p.lb, units.weight)}`
        : `${p.kind === 'dead' ? 'dead fish' : 'short fish'} ${formatWeight(p.lb, units.weight)}`,
    )
    .join(' · ');
}

/** The day's fish outside the counted bag, each with its state. */
const notCounted = (day: RecapDay) => {
  const counted = new Set(day.counted.map((c) => c.catchId));
  return day.fish.filter((f) => !counted.has(f.catchId));
};

/** Culled lists can run to thirty fish: the heaviest few show, the rest on request (and always in print). */
const CULLED_SHOWN = 8;

function FishChips({
  fish,
  kind,
  units,
  timeZone,
}: {
  fish: (RecapFish & { state?: keyof typeof FISH_STATE_LABELS })[];
  kind: 'counted' | 'culled';
  units: UnitPreferences;
  timeZone: string;
}) {
  const [all, setAll] = useState(false);
  if (fish.length === 0)
    return <p className={styles.muted}>{kind === 'counted' ? 'No fish counted.' : 'Every fish counted.'}</p>;
  const sorted = [...fish].sort((a, b) => b.weightLb - a.weightLb);
  const hidden = kind === 'culled' && !all ? Math.max(0, sorted.length - CULLED_SHOWN) : 0;
  return (
    <>
      <ul className={styles.fishList} aria-label={kind === 'counted' ? 'Counted fish' : 'Fish not counted'}>
        {sorted.slice(0, sorted.length - hidden).map((f) => (
          <li
            key={f.catchId}
            className={kind === 'counted' ? styles.fishCounted : styles.fishCulled}
            title={`${f.caughtAt ? clockOrDash(f.caughtAt, timeZone) : ''}${f.lengthIn ? ` · ${formatLength(f.lengthIn, units.length)}` : ''}${f.findName ? ` · ${f.findName}` : ''}`}
          >
            {formatWeight(f.weightLb, units.weight)}
            {kind === 'culled' && f.state ? ` · ${FISH_STATE_LABELS[f.state].toLowerCase()}` : ''}
          </li>
        ))}
      </ul>
      {hidden > 0 ? (
        <Button size="small" variant="invisible" className="sb-no-print" onClick={() => setAll(true)}>
          Show {hidden} more
        </Button>
      ) : null}
    </>
  );
}

/**
 * Each competition day by the one bag rule: the fish that counted (solid chips) and the rest with their state
 * (culled, released, short or dead fish: dashed chips), the penalties itemised, and the official figures beside
 * Shoalbook's own with the difference; the day place against the field when entered.
 */
export function BagByDay({ days, units, timeZone }: { days: RecapDay[]; units: UnitPreferences; timeZone: string }) {
  return (
    <div className={styles.days}>
      {days.map((day, index) => (
        <section key={day.date} className={styles.card} aria-labelledby={`recap-day-${index}`}>
          <Heading as="h4" variant="small" id={`recap-day-${index}`} className={styles.cardTitle}>
            Day {index + 1}: {dayLabel(day.date)}
          </Heading>
          <span className={styles.figure}>{formatWeight(day.official?.officialLb ?? day.netLb, units.weight)}</span>
          <Heading as="h5" variant="small">
            Counted ({day.counted.length})
          </Heading>
          <FishChips fish={day.counted} kind="counted" units={units} timeZone={timeZone} />
          <Heading as="h5" variant="small">
            Not counted ({notCounted(day).length})
          </Heading>
          <FishChips
            fish={notCounted(day)}
            kind="culled"
            units={units}
            timeZone={timeZone}
          />
          <dl className={styles.dl}>
            <dt>Bag (gross)</dt>
            <dd>{officialBesideLog(day.official?.grossLb, day.grossLb, units.weight)}</dd>
            <dt>Penalties</dt>
            <dd>
              {penaltyItems(day.penalties, units)}
              {day.official?.penaltyLb != null
                ? ` (scale ${formatWeight(day.official.penaltyLb, units.weight)})`
                : ''}
            </dd>
            <dt>Net</dt>
            <dd>
              {day.official?.officialLb != null
                ? officialBesideLog(day.official.officialLb, day.netLb, units.weight)
                : `${formatWeight(day.netLb, units.weight)} (our count; official not recorded)`}
            </dd>
            {day.official?.lateMinutes ? (
              <>
                <dt>Late check-in</dt>
                <dd>{day.official.lateMinutes} min</dd>
              </>
            ) : null}
            <dt>Day place</dt>
            <dd>{day.standing.place ?? ordinalPlace(day.official?.dayPlace ?? day.dayPlace)}</dd>
            {day.standing.readings.length > 1 ? (
              <>
                <dt>Against the field</dt>
                <dd>{day.standing.readings.slice(day.standing.place ? 1 : 0).join('; ')}</dd>
              </>
            ) : null}
          </dl>
        </section>
      ))}
    </div>
  );
}

export { ordinalPlace };
