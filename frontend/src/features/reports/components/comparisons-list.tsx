import { Button, Label } from '@primer/react';
import { useState } from 'react';
import type { EventComparison } from '../api/report-types';
import styles from './reports.module.css';

/** How many comparisons show before "Show all": a lake with four events and seven kinds yields thirty. */
const COMPARISONS_SHOWN = 6;

/**
 * What changed between events, in plain words, each with a badge saying whether the change is more than
 * chance (by the API's test at the 5 % level) or could be chance. The badge carries words, not colour alone.
 * The strongest changes come first; the long tail on request.
 */
export function ComparisonsList({ comparisons }: { comparisons: EventComparison[] }) {
  const [all, setAll] = useState(false);
  if (comparisons.length === 0) return <p className={styles.muted}>One event only: nothing to compare yet.</p>;
  const ordered = [...comparisons].sort(
    (a, b) => Number(b.moreThanChance) - Number(a.moreThanChance) || a.pValue - b.pValue,
  );
  const shown = all ? ordered : ordered.slice(0, COMPARISONS_SHOWN);
  return (
    <>
      <ul className={styles.comparisons} aria-label="Changes between events">
        {shown.map((c) => (
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
      {shown.length < ordered.length ? (
        <Button size="small" onClick={() => setAll(true)}>
          Show all {ordered.length} comparisons
        </Button>
      ) : null}
    </>
  );
}
