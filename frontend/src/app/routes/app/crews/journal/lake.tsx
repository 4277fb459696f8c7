import { PencilIcon, PlusIcon, UploadIcon } from '@primer/octicons-react';
import { Button, Heading } from '@primer/react';
import { Link, useNavigate } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { DeleteRecordButton } from '../../../../../components/journal-forms/confirm-delete-dialog';
import { journalPaths } from '../../../../../config/journal-paths';
import { EventsTable } from '../../../../../features/events';
import { useDeleteLake, useLake, useLakes } from '../../../../../features/lakes';
import { JournalHeader, useJournalPage, useParam } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/lakes/:lakeId: the lake and its events. */
export function Component() {
  const { crewId, canWrite } = useJournalPage();
  const lakeId = useParam('lakeId');
  const lake = useLake(crewId, lakeId);
  const lakes = useLakes(crewId);
  const remove = useDeleteLake(crewId);
  const navigate = useNavigate();
  if (lake.isPending) return <LoadingState label="Loading the lake…" />;
  if (lake.isError) return <ErrorState error={lake.error} onRetry={() => lake.refetch()} />;
  const l = lake.data;
  const position = l.lat !== null && l.lon !== null ? `${l.lat.toFixed(4)}, ${l.lon.toFixed(4)}` : null;
  return (
    <div className={styles.stack}>
      <JournalHeader
        title={l.name}
        lead={[
          l.region,
          l.timeZone.replace(/_/g, ' '),
          position,
          l.areaAcres ? `${l.areaAcres.toLocaleString('en-US')} acres` : null,
        ]
          .filter(Boolean)
          .join(' · ')}
        actions={
          canWrite ? (
            <>
              <Button as={Link} to={journalPaths.editLake.href(crewId, l.id)} leadingVisual={PencilIcon}>
                Edit lake
              </Button>
              <Button
                as={Link}
                to={journalPaths.import.href(crewId, { kind: 'gpx', lakeId: l.id })}
                leadingVisual={UploadIcon}
              >
                Import GPX
              </Button>
              <Button
                as={Link}
                to={journalPaths.newEvent.href(crewId, l.id)}
                variant="primary"
                leadingVisual={PlusIcon}
              >
                New event
              </Button>
              <DeleteRecordButton
                record={`the lake “${l.name}”`}
                consequence="A lake that still has events or finds is kept: delete those first. An empty lake goes with its notes and reference point."
                onDelete={() => remove.mutateAsync(l.id)}
                onDeleted={() => navigate(journalPaths.lakes.href(crewId))}
              />
            </>
          ) : undefined
        }
      />
      {l.notes ? <p>{l.notes}</p> : null}
      <Heading as="h3" className={styles.subheading}>
        Events on {l.name}
      </Heading>
      <EventsTable crewId={crewId} lakeId={l.id} lakes={lakes.data ?? [l]} canWrite={canWrite} />
    </div>
  );
}
