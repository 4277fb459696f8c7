import type { RecordChange } from '@shoalbook/shared';
import { Heading, Text } from '@primer/react';
import { clockTime, dayLabel, localDate } from '../../lib/lake-time';
import { ErrorState } from '../feedback/query-states';
import styles from './record-history.module.css';

/** How a record's screen names and writes one of its figures (in the user's units). */
export interface FigureWording<F extends string> {
  label: (field: F) => string;
  value: (field: F, canonical: number) => string;
}

/**
 * One change in words: "Weight: 3.45 lb → 3.54 lb, by Ray, 14:02" in lake time; the day is added when the
 * change was made on another day than the record's own.
 */
export function changeLine<F extends string>(
  change: RecordChange<F>,
  wording: FigureWording<F>,
  timeZone: string,
  recordDay?: string,
): string {
  const shown = (n: number | null) => (n === null ? 'none' : wording.value(change.field, n));
  const what = change.first ? `${shown(change.to)} as first recorded` : `${shown(change.from)} → ${shown(change.to)}`;
  const date = localDate(change.at, timeZone);
  const when = `${clockTime(change.at, timeZone)}${recordDay && date !== recordDay ? ` on ${dayLabel(date)}` : ''}`;
  return `${wording.label(change.field)}: ${what}, by ${change.byName ?? 'a former member'}, ${when}`;
}

/** A record's history as its journal kept it, oldest first; never edited, only added to. */
export function RecordHistory<F extends string>({
  title,
  headingId,
  changes,
  error,
  wording,
  timeZone,
  recordDay,
}: {
  title: string;
  headingId: string;
  changes: RecordChange<F>[] | undefined;
  error?: unknown;
  wording: FigureWording<F>;
  timeZone: string;
  recordDay?: string;
}) {
  return (
    <section aria-labelledby={headingId} className={styles.history}>
      <Heading as="h3" id={headingId} className={styles.heading}>
        {title}
      </Heading>
      {error ? (
        <ErrorState error={error} title="The history could not be loaded" />
      ) : !changes ? (
        <Text size="small" className={styles.muted}>
          Reading the journal…
        </Text>
      ) : changes.length === 0 ? (
        <Text size="small" className={styles.muted}>
          Nothing recorded yet.
        </Text>
      ) : (
        <ol className={styles.list}>
          {changes.map((change, i) => (
            <li key={`${change.at}-${change.field}-${i}`}>{changeLine(change, wording, timeZone, recordDay)}</li>
          ))}
        </ol>
      )}
      <Text as="p" size="small" className={styles.muted}>
        Times in the lake&apos;s time ({timeZone}). Every change stays in the crew&apos;s journal.
      </Text>
    </section>
  );
}
