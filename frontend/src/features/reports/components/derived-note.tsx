import { Label, Text } from '@primer/react';
import styles from './reports.module.css';

/** The "derived from catches" badge, for a figure of an event that has catches but no stops. */
export function DerivedBadge() {
  return (
    <Label variant="attention" size="small">
      derived from catches
    </Label>
  );
}

/**
 * Says plainly what "derived from catches" means where a report covers such events: logged before stops
 * existed, a find counts as fished only where it produced, so the hit rate there overstates.
 */
export function DerivedNote({ events }: { events: number }) {
  if (events <= 0) return null;
  return (
    <Text as="p" size="small" className={styles.muted}>
      <DerivedBadge /> {events === 1 ? 'One event here has' : `${events} events here have`} catches but no stops: there
      a find counts as fished only where it produced a fish (one stop per find and day with a catch), so finds tried
      without a bite are missing, the hit rate reads high and no time fished is known.
    </Text>
  );
}
