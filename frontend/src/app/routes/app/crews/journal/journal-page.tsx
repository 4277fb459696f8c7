import { Heading, Text } from '@primer/react';
import type { ReactNode } from 'react';
import { useParams } from 'react-router-dom';
import { useDocumentTitle } from '../../../../../components/layouts/page-header';
import { useUnitPreferences } from '../../../../../lib/journal-access';
import { canWriteJournal } from '../../../../../lib/authorization';
import { useCrew } from '../crew-layout';
import styles from './journal.module.css';

/** What every journal screen needs: the crew, whether the caller may write, and the caller's units. */
export function useJournalPage() {
  const crew = useCrew();
  const prefs = useUnitPreferences();
  return { crew, crewId: crew.id, prefs, canWrite: canWriteJournal(crew.role), canExport: canWriteJournal(crew.role) };
}

/** A required route parameter (the router only matches when it is there). */
export function useParam(name: string): string {
  return useParams()[name] ?? '';
}

/** The title row of a journal screen (h2: the crew's name is the page's h1). */
export function JournalHeader({
  title,
  lead,
  actions,
  docTitle,
}: {
  title: string;
  lead?: ReactNode;
  actions?: ReactNode;
  docTitle?: string;
}) {
  useDocumentTitle(docTitle ?? title);
  return (
    <div className={styles.header}>
      <div>
        <Heading as="h2" className={styles.title}>
          {title}
        </Heading>
        {lead ? (
          <Text as="div" className={styles.lead}>
            {lead}
          </Text>
        ) : null}
      </div>
      {actions ? <div className={styles.actions}>{actions}</div> : null}
    </div>
  );
}
