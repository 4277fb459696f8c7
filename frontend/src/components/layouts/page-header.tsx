import { Heading, Text } from '@primer/react';
import { useEffect, type ReactNode } from 'react';
import styles from './page-header.module.css';

/** A screen's h1 with an optional lead line; also sets the document title. */
export function PageHeader({ title, lead, actions }: { title: string; lead?: ReactNode; actions?: ReactNode }) {
  useDocumentTitle(title);
  return (
    <div className={styles.header}>
      <div>
        <Heading as="h1" className={styles.title}>
          {title}
        </Heading>
        {lead ? (
          <Text as="p" className={styles.lead}>
            {lead}
          </Text>
        ) : null}
      </div>
      {actions ? <div className={styles.actions}>{actions}</div> : null}
    </div>
  );
}

/** "<page> · Shoalbook" in the browser tab. */
export function useDocumentTitle(title: string) {
  useEffect(() => {
    document.title = `${title} · Shoalbook`;
  }, [title]);
}
