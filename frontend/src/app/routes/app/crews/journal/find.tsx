import { PencilIcon } from '@primer/octicons-react';
import { Button } from '@primer/react';
import { Link, useNavigate } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { DeleteRecordButton } from '../../../../../components/journal-forms/confirm-delete-dialog';
import { journalPaths } from '../../../../../config/journal-paths';
import { FindDetail, useDeleteFind, useFind } from '../../../../../features/finds';
import { useLake } from '../../../../../features/lakes';
import { JournalHeader, useJournalPage, useParam } from './journal-page';

/** /crews/:crewId/finds/:findId: the find, its photo, and the sun and moon when it was marked. */
export function Component() {
  const { crewId, canWrite, prefs } = useJournalPage();
  const findId = useParam('findId');
  const find = useFind(crewId, findId);
  const lake = useLake(crewId, find.data?.lakeId);
  const remove = useDeleteFind(crewId);
  const navigate = useNavigate();
  if (find.isPending) return <LoadingState label="Loading the find…" />;
  if (find.isError) return <ErrorState error={find.error} onRetry={() => find.refetch()} />;
  return (
    <>
      <JournalHeader
        title={find.data.name || 'Unnamed find'}
        lead={lake.data ? `On ${lake.data.name}` : undefined}
        actions={
          canWrite ? (
            <>
              <Button as={Link} to={journalPaths.editFind.href(crewId, findId)} leadingVisual={PencilIcon}>
                Edit find
              </Button>
              <DeleteRecordButton
                record={`the find “${find.data.name || 'Unnamed find'}”`}
                consequence="Catches that came from it stay in the journal, without a find."
                onDelete={() => remove.mutateAsync(findId)}
                onDeleted={() =>
                  navigate(
                    find.data.eventId
                      ? journalPaths.event.href(crewId, find.data.eventId, 'finds')
                      : `${journalPaths.finds.href(crewId)}?lakeId=${encodeURIComponent(find.data.lakeId)}`,
                  )
                }
              />
            </>
          ) : undefined
        }
      />
      <FindDetail crewId={crewId} find={find.data} lake={lake.data} prefs={prefs} />
    </>
  );
}
