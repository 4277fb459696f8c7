import { PencilIcon, PlusIcon, UploadIcon } from '@primer/octicons-react';
import type { EventView, LakeView, UnitPreferences } from '@shoalbook/shared';
import { Button, Details, Heading, SegmentedControl, UnderlineNav } from '@primer/react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorState, LoadingState } from '../../../../../components/feedback/query-states';
import { DeleteRecordButton } from '../../../../../components/journal-forms/confirm-delete-dialog';
import { EVENT_SECTIONS, journalPaths, type EventSection } from '../../../../../config/journal-paths';
import { CatchEntryForm, CatchesTable, useCatches } from '../../../../../features/catches';
import {
  CheckInClock,
  CompetitionDayForm,
  EventSummary,
  PracticeDaysPanel,
  useDeleteEvent,
  useEvent,
  useEventDays,
} from '../../../../../features/events';
import { FindsTable, useFinds } from '../../../../../features/finds';
import { ExportButtons } from '../../../../../features/imports';
import { UnitsNote } from '../../../../../features/journal-units';
import { useLake } from '../../../../../features/lakes';
import { StopsPanel, useOpenStop } from '../../../../../features/stops';
import { LiveBagPanel, WeighInsPanel } from '../../../../../features/weigh-ins';
import { WaitingEntries } from '../../../../../components/send-queue/waiting-entries';
import { useSignedInMe } from '../../../../../lib/auth';
import type { SendKind } from '../../../../../lib/device-db';
import { dayLabel } from '../../../../../lib/lake-time';
import { JournalHeader, useJournalPage, useParam } from './journal-page';
import styles from './journal.module.css';
import { SunlightTheme } from '../../../../../components/journal-forms/sunlight-theme';

const SECTION_LABELS: Record<EventSection, string> = {
  overview: 'Overview',
  // Short enough that all four fit a phone's width (the nav hides overflow behind "More").
  finds: 'Finds',
  days: 'Days',
  'weigh-ins': 'Weigh-ins',
};

/** /crews/:crewId/events/:eventId?section=…: the event with its practice finds, competition days and weigh-ins. */
export function Component() {
  const { crewId, canWrite, canExport, prefs } = useJournalPage();
  const me = useSignedInMe();
  const eventId = useParam('eventId');
  const [search] = useSearchParams();
  const requested = search.get('section') as EventSection | null;
  const section: EventSection = requested && EVENT_SECTIONS.includes(requested) ? requested : 'overview';
  const event = useEvent(crewId, eventId);
  const lake = useLake(crewId, event.data?.lakeId);
  const remove = useDeleteEvent(crewId);
  const navigate = useNavigate();

  if (event.isPending) return <LoadingState label="Loading the event…" />;
  if (event.isError) return <ErrorState error={event.error} onRetry={() => event.refetch()} />;
  const e = event.data;
  return (
    <>
      <JournalHeader
        title={e.name}
        docTitle={`${e.name}: ${SECTION_LABELS[section]}`}
        lead={<UnitsNote prefs={prefs} />}
        actions={
          canWrite ? (
            <>
              <Button as={Link} to={journalPaths.editEvent.href(crewId, e.id)} leadingVisual={PencilIcon}>
                Edit event
              </Button>
              <DeleteRecordButton
                record={`the event “${e.name}”`}
                consequence="Its practice days, competition days and weigh-in records go with it. An event that still has finds or catches is kept: delete those first."
                onDelete={() => remove.mutateAsync(e.id)}
                onDeleted={() => navigate(journalPaths.lake.href(crewId, e.lakeId))}
              />
            </>
          ) : undefined
        }
      />
      <UnderlineNav aria-label="Event sections" className={styles.sectionNav}>
        {EVENT_SECTIONS.map((s) => (
          <UnderlineNav.Item
            key={s}
            as={Link}
            to={journalPaths.event.href(crewId, e.id, s)}
            aria-current={s === section ? 'page' : undefined}
          >
            {SECTION_LABELS[s]}
          </UnderlineNav.Item>
        ))}
      </UnderlineNav>
      {lake.isError ? <ErrorState error={lake.error} onRetry={() => lake.refetch()} /> : null}
      {section === 'overview' ? (
        <div className={styles.stack}>
          <EventSummary event={e} lake={lake.data} prefs={prefs} />
          {canExport ? <ExportButtons crewId={crewId} lakeId={e.lakeId} /> : null}
        </div>
      ) : null}
      {section === 'finds' && lake.data ? (
        <EventFinds crewId={crewId} event={e} lake={lake.data} prefs={prefs} canWrite={canWrite} />
      ) : null}
      {section === 'days' && lake.data ? (
        <EventDays crewId={crewId} event={e} lake={lake.data} prefs={prefs} canWrite={canWrite} />
      ) : null}
      {section === 'weigh-ins' && lake.data ? (
        <WeighInsPanel
          userId={me.user.id}
          crewId={crewId}
          eventId={e.id}
          rules={e.rules}
          prefs={prefs}
          timeZone={lake.data.timeZone}
          canWrite={canWrite}
        />
      ) : null}
      {section !== 'overview' && lake.isPending ? <LoadingState label="Loading the lake…" /> : null}
    </>
  );
}

interface SectionProps {
  crewId: string;
  event: EventView;
  lake: LakeView;
  prefs: UnitPreferences;
  canWrite: boolean;
}

function EventFinds(props: SectionProps) {
  return (
    <div className={styles.stack}>
      <PracticeDaysPanel crewId={props.crewId} eventId={props.event.id} prefs={props.prefs} canWrite={props.canWrite} />
      <Heading as="h3" className={styles.subheading}>
        Practice finds
      </Heading>
      <EventFindsTable {...props} />
    </div>
  );
}

function EventFindsTable({ crewId, event, lake, prefs, canWrite }: SectionProps) {
  const finds = useFinds(crewId, { eventId: event.id });
  if (finds.isPending) return <LoadingState label="Loading finds…" />;
  if (finds.isError) return <ErrorState error={finds.error} onRetry={() => finds.refetch()} />;
  const actions = canWrite ? (
    <>
      <Button
        as={Link}
        to={journalPaths.newFind.href(crewId, { lakeId: lake.id, eventId: event.id })}
        leadingVisual={PlusIcon}
      >
        Add a find
      </Button>
      <Button
        as={Link}
        to={journalPaths.import.href(crewId, { kind: 'gpx', lakeId: lake.id, eventId: event.id })}
        leadingVisual={UploadIcon}
      >
        Import GPX
      </Button>
    </>
  ) : null;
  if (finds.data.length === 0) {
    return (
      <EmptyState title="No practice finds for this event" action={actions}>
        {canWrite
          ? 'Add each place you marked in practice (position, depth, kind of bottom, what the sonar showed), or import your waypoints from a GPX file.'
          : 'Finds appear here once an angler records them.'}
      </EmptyState>
    );
  }
  return (
    <FindsTable crewId={crewId} finds={finds.data} prefs={prefs} timeZoneOf={() => lake.timeZone} toolbar={actions} />
  );
}

/** The day's catches list shows the catches still on the phone; stops waiting show in the stops panel. */
const CATCH_KINDS: SendKind[] = ['log-catch'];

function EventDays({ crewId, event, lake, prefs, canWrite }: SectionProps) {
  const [search, setSearch] = useSearchParams();
  const me = useSignedInMe();
  const days = useEventDays(crewId, event.id);
  const finds = useFinds(crewId, { lakeId: lake.id });
  const dayId = search.get('day');
  const day = days.data?.competition.find((d) => d.id === dayId) ?? days.data?.competition[0];
  const catches = useCatches(crewId, { competitionDayId: day?.id });
  const openStop = useOpenStop({
    crewId,
    userId: me.user.id,
    day: day ?? { id: '', date: '', eventId: event.id },
    timeZone: lake.timeZone,
    finds: finds.data ?? [],
  });
  if (days.isPending) return <LoadingState label="Loading the days…" />;
  if (days.isError) return <ErrorState error={days.error} onRetry={() => days.refetch()} />;
  const competition = days.data.competition;
  if (!day) {
    return (
      <EmptyState title="No competition days">
        Edit the event and add its competition days; catches are logged per day.
      </EmptyState>
    );
  }
  return (
    <SunlightTheme>
      <div className={styles.stack}>
        <SegmentedControl aria-label="Competition day">
          {competition.map((d) => (
            <SegmentedControl.Button
              key={d.id}
              selected={d.id === day.id}
              onClick={() =>
                setSearch((s) => {
                  const next = new URLSearchParams(s);
                  next.set('day', d.id);
                  return next;
                })
              }
            >
              {dayLabel(d.date)}
            </SegmentedControl.Button>
          ))}
        </SegmentedControl>
        <CheckInClock key={day.id} day={day} lake={lake} ramp={event.ramp ?? null} unit={prefs.depth} />
        {canWrite ? (
          <Details className={styles.details}>
            <Details.Summary>Start, check-in, weather and water of this day</Details.Summary>
            <CompetitionDayForm key={day.id} crewId={crewId} day={day} prefs={prefs} />
          </Details>
        ) : null}
        <StopsPanel
          crewId={crewId}
          userId={me.user.id}
          day={day}
          lake={lake}
          finds={finds.data ?? []}
          catches={catches.data ?? []}
          prefs={prefs}
          canWrite={canWrite}
        />
        {/* On a phone the live bag sits above the catch form, in sight while the next fish is entered. */}
        <div className={styles.bagAndForm}>
          {canWrite ? (
            finds.isPending ? (
              <LoadingState label="Loading finds for the list…" />
            ) : (
              <CatchEntryForm
                key={day.id}
                userId={me.user.id}
                crewId={crewId}
                day={day}
                lake={lake}
                finds={finds.data ?? []}
                prefs={prefs}
                stopDefaults={
                  openStop
                    ? {
                        stopId: openStop.id,
                        findId: openStop.findId,
                        place: openStop.findName ?? 'no find',
                        lure: openStop.lure,
                        technique: openStop.technique,
                      }
                    : null
                }
              />
            )
          ) : null}
          <div className={styles.bagFirst}>
            <LiveBagPanel crewId={crewId} eventId={event.id} dayId={day.id} rules={event.rules} prefs={prefs} />
          </div>
        </div>
        <Heading as="h3" className={styles.subheading}>
          Catches of {dayLabel(day.date)}
        </Heading>
        <WaitingEntries userId={me.user.id} crewId={crewId} scope={day.id} kinds={CATCH_KINDS} />
        <DayCatches
          crewId={crewId}
          dayId={day.id}
          lake={lake}
          prefs={prefs}
          canWrite={canWrite}
          finds={finds.data ?? []}
        />
      </div>
    </SunlightTheme>
  );
}

function DayCatches({
  crewId,
  dayId,
  lake,
  prefs,
  canWrite,
  finds,
}: {
  crewId: string;
  dayId: string;
  lake: LakeView;
  prefs: UnitPreferences;
  canWrite: boolean;
  finds: Parameters<typeof CatchesTable>[0]['finds'];
}) {
  const catches = useCatches(crewId, { competitionDayId: dayId }, { live: true });
  if (catches.isPending) return <LoadingState label="Loading catches…" />;
  if (catches.isError) return <ErrorState error={catches.error} onRetry={() => catches.refetch()} />;
  return (
    <CatchesTable
      crewId={crewId}
      catches={catches.data}
      finds={finds}
      prefs={prefs}
      timeZone={lake.timeZone}
      canWrite={canWrite}
      caption="Catches of the day"
    />
  );
}
