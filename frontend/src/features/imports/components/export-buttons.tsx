import { DownloadIcon } from '@primer/octicons-react';
import { LinkButton } from '@primer/react';
import { PositionsFileCaution } from '../../../components/cautions/journal-cautions';
import { API_BASE } from '../../../lib/api-client';
import { crewApiPath } from '../../../lib/journal-keys';
import styles from './imports.module.css';

/** The crew's whole journal as JSON or CSV (owners and anglers; the file holds positions, so viewers do not see this). */
export function ExportButtons({ crewId }: { crewId: string }) {
  return (
    <div className={styles.panel}>
      <PositionsFileCaution />
      <div className={styles.actions}>
        <LinkButton
          href={`${API_BASE}${crewApiPath(crewId, '/export.json')}`}
          download="shoalbook-journal.json"
          leadingVisual={DownloadIcon}
        >
          Export journal (JSON)
        </LinkButton>
        <LinkButton
          href={`${API_BASE}${crewApiPath(crewId, '/export.csv')}`}
          download="shoalbook-journal.csv"
          leadingVisual={DownloadIcon}
        >
          Export journal (CSV)
        </LinkButton>
      </div>
    </div>
  );
}
