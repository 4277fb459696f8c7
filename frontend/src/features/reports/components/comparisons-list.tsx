import { Label } from '@primer/react';
import type { EventComparison } from '../api/report-types';
import styles from './reports.module.css';

/**
 * What changed between events, in plain words, each with a badge saying whether the change is more than
 * chance (by the API's test at the 5 % level) or could be chance. The badge carries words, not colour alone.
 */
export function ComparisonsList({ comparisons }: { comparisons: EventComparison[] }) {
  if (comparisons.length === 0) return <p className={styles.muted}>One event only: nothing to compare yet.</p>;
  const ordered = [...comparisons].sort(
    (a, b) => Number(b.moreThanChance) - Number(a.moreThanChance) || a.pValue - b.pValue,
  );
  return (
    <ul className={styles.comparisons} aria-label="Changes between events">
      {ordered.map((c) => (
        <li key={`${c.key ?? 'none'}-${c.a}-${c.b}`} className={styles.comparison}>
          {c.moreThanChance ? (
            <Label variant="success" size="large">
              more than chance
            </Label>
          ) : (
            <Label variant="secondary" size="large">
              could be chance
            </Label>
          )}
          <span>{c.reading}</span>
        </li>
      ))}
    </ul>
  );
}
