import { ArrowLeftIcon } from '@primer/octicons-react';
import { Banner, Button } from '@primer/react';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { DeleteRecordButton } from '../../../../../components/journal-forms/confirm-delete-dialog';
import { journalPaths } from '../../../../../config/journal-paths';
import {
  CatchEditForm,
  CatchFacts,
  CatchHistory,
  CatchSide,
  catchName,
  useCatch,
  useDeleteCatch,
} from '../../../../../features/catches';
import { useEvent } from '../../../../../features/events';
import { useFinds } from '../../../../../features/finds';
import { UnitsNote } from '../../../../../features/journal-units';
import { useLake } from '../../../../../features/lakes';
import { useSignedInMe } from '../../../../../lib/auth';
import { dayLabel } from '../../../../../lib/lake-time';
import { JournalHeader, useJournalPage, useParam } from './journal-page';
import styles from './journal.module.css';

/** /crews/:crewId/catches/:catchId: one catch with its sun and moon and photo; writers correct or delete it here. */
export function Component() {
  const { crewId, canWrite, prefs } = useJournalPage();
  const me = useSignedInMe();
  const catchId = useParam('catchId');
  const navigate = useNavigate();
  const found = useCatch(crewId, catchId);
  const event = useEvent(crewId, found.data?.eventId);
  const lake = useLake(crewId, event.data?.lakeId);
  const finds = useFinds(crewId, { lakeId: event.data?.lakeId });
  const remove = useDeleteCatch(crewId);
  const [saved, setSaved] = useState(false);

  if (found.isError) return <ErrorState error={found.error} onRetry={() => found.refetch()} />;
  const failed = [event, lake, finds].find((q) => q.isError);
  if (failed) return <ErrorState error={failed.error} onRetry={() => failed.refetch()} />;
  if (!found.data || !event.data || !lake.data || !finds.data) return <LoadingState label="Loading the catch…" />;
  const c = found.data;
  const zone = lake.data.timeZone;
  const name = catchName(c, prefs, zone);
  const dayHref = `${journalPaths.event.href(crewId, c.eventId, 'days')}${c.competitionDayId ? `&day=${encodeURIComponent(c.competitionDayId)}` : ''}`;
  const title = name.charAt(0).toUpperCase() + name.slice(1);

  return (
    <div className={styles.stack}>
      <JournalHeader
        title={title}
        lead={
          <>
            {dayLabel(c.competitionDate)} · {event.data.name} · {lake.data.name}
            <br />
            <UnitsNote prefs={prefs} />
          </>
        }
        actions={
          <>
            <Button as={Link} to={dayHref} leadingVisual={ArrowLeftIcon}>
              Back to the day
            </Button>
            {canWrite ? (
              <DeleteRecordButton
                record={name}
                consequence={`The counted bag and weigh-in of ${dayLabel(c.competitionDate)} are worked out again without it.`}
                onDelete={() => remove.mutateAsync(c.id)}
                onDeleted={() => navigate(dayHref)}
              />
            ) : null}
          </>
        }
      />
      {saved ? (
        <Banner
          variant="success"
          layout="compact"
          title="Changes saved"
          description="The day's bag and weigh-in are recounted with them."
          onDismiss={() => setSaved(false)}
        />
      ) : null}
      <div className={styles.detailLayout}>
        {canWrite ? (
          <CatchEditForm
            key={c.version}
            userId={me.user.id}
            crewId={crewId}
            catchView={c}
            finds={finds.data}
            prefs={prefs}
            timeZone={zone}
            onSaved={() => setSaved(true)}
            onEdit={() => setSaved(false)}
            onReload={() => {
              setSaved(false);
              void found.refetch();
            }}
          />
        ) : (
          <CatchFacts catchView={c} prefs={prefs} timeZone={zone} />
        )}
        <CatchSide crewId={crewId} catchView={c} timeZone={zone}>
          <CatchHistory
            crewId={crewId}
            catchId={c.id}
            competitionDate={c.competitionDate}
            prefs={prefs}
            timeZone={zone}
          />
        </CatchSide>
      </div>
    </div>
  );
}
