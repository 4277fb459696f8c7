import { DownloadIcon } from '@primer/octicons-react';
import { FormControl, LinkButton, Select, Text } from '@primer/react';
import { useState } from 'react';
import { PositionsFileCaution } from '../../../components/cautions/journal-cautions';
import { API_BASE } from '../../../lib/api-client';
import { crewApiPath } from '../../../lib/journal-keys';
import { useLakes } from '../../lakes';
import styles from './imports.module.css';

/**
 * The crew's whole journal as JSON or CSV, and one lake's finds as GPX for a unit or mapping app (owners and
 * anglers; the files hold positions, so viewers do not see this).
 */
export function ExportButtons({ crewId, lakeId }: { crewId: string; lakeId?: string }) {
  const lakes = useLakes(crewId);
  const [chosenLake, setChosenLake] = useState('');
  const gpxLake = chosenLake || lakeId || lakes.data?.[0]?.id || '';
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
      {lakes.data?.length ? (
        <div className={styles.gpxExport}>
          <FormControl>
            <FormControl.Label>Lake for the GPX file</FormControl.Label>
            <Select value={gpxLake} onChange={(e) => setChosenLake(e.target.value)}>
              {lakes.data.map((l) => (
                <Select.Option key={l.id} value={l.id}>
                  {l.name}
                </Select.Option>
              ))}
            </Select>
          </FormControl>
          <LinkButton
            href={`${API_BASE}${crewApiPath(crewId, `/lakes/${encodeURIComponent(gpxLake)}/finds.gpx`)}`}
            download="shoalbook-finds.gpx"
            leadingVisual={DownloadIcon}
          >
            Export finds (GPX)
          </LinkButton>
          <Text as="p" size="small" className={styles.gpxHint}>
            One waypoint per find of that lake, with its name, time, kind, depth and notes; Import GPX reads them back.
          </Text>
        </div>
      ) : null}
    </div>
  );
}
