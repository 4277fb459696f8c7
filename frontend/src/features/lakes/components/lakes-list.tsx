import type { LakeView } from '@shoalbook/shared';
import { Button, Heading, Link as PrimerLink, Text } from '@primer/react';
import { Link } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { journalPaths } from '../../../config/journal-paths';
import { useLakes } from '../api/lakes-api';
import styles from './lakes-list.module.css';

/** The crew's lakes, each with its zone and reference point; positions hidden from viewers where the crew says so. */
export function LakesList({ crewId, canWrite }: { crewId: string; canWrite: boolean }) {
  const lakes = useLakes(crewId);
  if (lakes.isPending) return <LoadingState label="Loading lakes…" />;
  if (lakes.isError) return <ErrorState error={lakes.error} onRetry={() => lakes.refetch()} />;
  if (lakes.data.length === 0) {
    return (
      <EmptyState
        title="No lakes yet"
        action={
          canWrite ? (
            <Button as={Link} to={journalPaths.newLake.href(crewId)} variant="primary">
              Add the first lake
            </Button>
          ) : undefined
        }
      >
        {canWrite
          ? 'Add a lake with its name, its time zone and a point on the water; events, finds and catches hang off it.'
          : 'An angler of the crew adds lakes; they will appear here.'}
      </EmptyState>
    );
  }
  return (
    <ul className={styles.list}>
      {lakes.data.map((lake) => (
        <LakeCard key={lake.id} crewId={crewId} lake={lake} />
      ))}
    </ul>
  );
}

function LakeCard({ crewId, lake }: { crewId: string; lake: LakeView }) {
  return (
    <li className={styles.card}>
      <Heading as="h2" className={styles.name}>
        <PrimerLink as={Link} to={journalPaths.lake.href(crewId, lake.id)}>
          {lake.name}
        </PrimerLink>
      </Heading>
      <Text as="p" size="small" className={styles.meta}>
        {[
          lake.region,
          lake.timeZone.replace(/_/g, ' '),
          lake.areaAcres ? `${lake.areaAcres.toLocaleString('en-US')} acres` : null,
        ]
          .filter(Boolean)
          .join(' · ')}
      </Text>
    </li>
  );
}
