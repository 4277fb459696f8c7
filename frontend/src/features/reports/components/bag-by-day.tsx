import { Button, Heading } from '@primer/react';
import { useState } from 'react';
import type { UnitPreferences } from '@shoalbook/shared';
import { clockOrDash, dayLabel } from '../../../lib/lake-time';
import { formatLength, formatWeight } from '../../../lib/units';
import type { RecapDay, RecapFish } from '../api/report-types';
import styles from './reports.module.css';

function ordinalPlace(n: number | null | undefined): string {
  if (!n) return '—';
  const teen = n % 100 >= 11 && n % 100 <= 13;
  return `${n}${teen ? 'th' : n % 10 === 1 ? 'st' : n % 10 === 2 ? 'nd' : n % 10 === 3 ? 'rd' : 'th'}`;
}

/** Culled lists can run to thirty fish: the heaviest few show, the rest on request (and always in print). */
const CULLED_SHOWN = 8;

function FishChips({
  fish,
  kind,
  units,
  timeZone,
}: {
  fish: RecapFish[];
  kind: 'counted' | 'culled';
  units: UnitPreferences;
  timeZone: string;
}) {
  const [all, setAll] = useState(false);
  if (fish.length === 0)
    return <p className={styles.muted}>{kind === 'counted' ? 'No fish counted.' : 'None culled.'}</p>;
  const sorted = [...fish].sort((a, b) => b.weightLb - a.weightLb);
  const hidden = kind === 'culled' && !all ? Math.max(0, sorted.length - CULLED_SHOWN) : 0;
  return (
    <>
      <ul className={styles.fishList} aria-label={kind === 'counted' ? 'Counted fish' : 'Culled fish'}>
        {sorted.slice(0, sorted.length - hidden).map((f) => (
          <li
            key={f.catchId}
            className={kind === 'counted' ? styles.fishCounted : styles.fishCulled}
            title={`${f.caughtAt ? clockOrDash(f.caughtAt, timeZone) : ''}${f.lengthIn ? ` · ${formatLength(f.lengthIn, units.length)}` : ''}${f.findName ? ` · ${f.findName}` : ''}`}
          >
            {formatWeight(f.weightLb, units.weight)}
          </li>
        ))}
      </ul>
      {hidden > 0 ? (
        <Button size="small" variant="invisible" className="sb-no-print" onClick={() => setAll(true)}>
          Show {hidden} more culled
        </Button>
      ) : null}
    </>
  );
}

/**
 * Each competition day: the fish that counted (solid chips) and the ones culled for bigger fish (dashed
 * chips, listed apart), the crew's own bag math and, when recorded, the official figures and day place.
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
            Culled ({day.culled.length})
          </Heading>
          <FishChips fish={day.culled} kind="culled" units={units} timeZone={timeZone} />
          <dl className={styles.dl}>
            <dt>Bag (gross)</dt>
            <dd>{formatWeight(day.grossLb, units.weight)}</dd>
            <dt>Penalties</dt>
            <dd>{day.penaltyLb > 0 ? `− ${formatWeight(day.penaltyLb, units.weight)}` : 'none'}</dd>
            <dt>Net, our count</dt>
            <dd>{formatWeight(day.netLb, units.weight)}</dd>
            <dt>Official</dt>
            <dd>
              {day.official?.officialLb !== undefined && day.official?.officialLb !== null
                ? formatWeight(day.official.officialLb, units.weight)
                : 'not recorded'}
            </dd>
            {day.official?.lateMinutes ? (
              <>
                <dt>Late check-in</dt>
                <dd>{day.official.lateMinutes} min</dd>
              </>
            ) : null}
            <dt>Day place</dt>
            <dd>{ordinalPlace(day.official?.dayPlace ?? day.dayPlace)}</dd>
          </dl>
        </section>
      ))}
    </div>
  );
}

export { ordinalPlace };
