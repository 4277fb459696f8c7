import { Heading, Text } from '@primer/react';
import { Link } from 'react-router-dom';
import { useDocumentTitle } from '../../../../components/layouts/page-header';
import { canWriteJournal } from '../../../../lib/authorization';
import { CREW_SECTIONS } from './crew-sections';
import { useCrew } from './crew-layout';
import styles from './crew.module.css';

const SECTION_TEXT: Record<string, string> = Object.fromEntries(
  [
    { title: 'Lakes', text: 'The waters your crew fishes, each with its own time zone for sun and moon times.' },
    { title: 'Events', text: 'Tournaments with their practice and competition days and the rules of each.' },
    { title: 'Finds', text: 'The places marked in practice: depth, bottom, grass, bait and what the sonar showed.' },
    { title: 'Catches', text: 'Fish from competition days, tied to the find they came from.' },
    { title: 'Reports', text: 'Which kinds of places paid off, by depth, temperature, time of day and more.' },
  ].map(({ title, text }) => [title, text]),
);

/** /crews/:crewId: the journal's front page, a welcome leading to each section. */
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
      <ul className={styles.comingList} aria-label="Sections of the journal">
        {CREW_SECTIONS.filter(
          (section) => SECTION_TEXT[section.label] && (!section.roles || section.roles.includes(crew.role)),
        ).map((section) => (
          <li key={section.id} className={styles.comingItem}>
            <Link to={section.href(crew.id)} className={styles.comingTitle}>
              {section.label}
            </Link>
            <span className={styles.comingText}>{SECTION_TEXT[section.label]}</span>
          </li>
        ))}
      </ul>
      <Text as="p" size="small" className={styles.comingText}>
        New crew? Start with a lake, then an event with its practice and competition days; finds and catches follow.
      </Text>
    </section>
  );
}
