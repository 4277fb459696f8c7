import { Heading, Text } from '@primer/react';
import { useDocumentTitle } from '../../../../components/layouts/page-header';
import { canWriteJournal } from '../../../../lib/authorization';
import { useCrew } from './crew-layout';
import styles from './crew.module.css';

const COMING = [
  { title: 'Lakes', text: 'The waters your crew fishes, each with its own time zone for sun and moon times.' },
  { title: 'Events', text: 'Tournaments with their practice and competition days and the rules of each.' },
  { title: 'Finds', text: 'The places marked in practice: depth, bottom, grass, bait and what the sonar showed.' },
  { title: 'Catches', text: 'Fish from competition days, tied to the find they came from.' },
  { title: 'Reports', text: 'Which kinds of places paid off, by depth, temperature, time of day and more.' },
];

/** /crews/:crewId: the journal's front page. For now, a welcome saying what will appear here. */
export function Component() {
  const crew = useCrew();
  useDocumentTitle(`${crew.name}: journal`);
  const writer = canWriteJournal(crew.role);
  return (
    <section aria-labelledby="journal-heading" className={styles.welcome}>
      <Heading as="h2" id="journal-heading" variant="medium">
        Welcome to the journal
      </Heading>
      <Text as="p">
        This is where {crew.name} keeps its season: every practice find, every fish that crossed the scale, and the
        reports that show which places paid off.{' '}
        {writer
          ? 'Anglers and owners add to it; viewers read along.'
          : 'As a viewer you can read everything the crew shares here; changes are made by its anglers and owners.'}
      </Text>
      <ul className={styles.comingList} aria-label="Coming to the journal">
        {COMING.map((item) => (
          <li key={item.title} className={styles.comingItem}>
            <span className={styles.comingTitle}>{item.title}</span>
            <span className={styles.comingText}>{item.text}</span>
          </li>
        ))}
      </ul>
      <Text as="p" size="small" className={styles.comingText}>
        These sections are on their way. Until then, invite your crew so everyone is in place for the first event.
      </Text>
    </section>
  );
}
