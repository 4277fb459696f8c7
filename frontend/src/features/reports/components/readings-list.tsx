import { Heading } from '@primer/react';
import styles from './reports.module.css';

/** The API's plain-words readings of a report, as a list a non-statistician can read aloud. */
export function ReadingsList({ readings, title = 'In plain words' }: { readings: string[]; title?: string }) {
  if (readings.length === 0) return null;
  const id = `readings-${title.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <section aria-labelledby={id} className={styles.readings}>
      <Heading as="h3" variant="small" id={id}>
        {title}
      </Heading>
      <ul className={styles.readingsList}>
        {readings.map((reading, index) => (
          <li key={`${index}-${reading}`}>{reading}</li>
        ))}
      </ul>
    </section>
  );
}
