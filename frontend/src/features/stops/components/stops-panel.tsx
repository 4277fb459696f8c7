import type { CatchView, CompetitionDayView, FindView, LakeView, StopView, UnitPreferences } from '@shoalbook/shared';
import { PencilIcon } from '@primer/octicons-react';
import { Button, Heading, Label, Text } from '@primer/react';
import { useState } from 'react';
import { ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { DeleteRecordButton } from '../../../components/journal-forms/confirm-delete-dialog';
import { clockTime } from '../../../lib/lake-time';
import { useSendEntries } from '../../../lib/send-queue';
import { formatTemperature, formatWeight } from '../../../lib/units';
import { useDayStops, useDeleteStop, useSentStopsInDayLists } from '../api/stops-api';
import { ArriveLeave } from './arrive-leave';
import { DayTimeline } from './day-timeline';
import { layoutDay } from './day-timeline-model';
import { StopEditForm } from './stop-edit-form';
import { stopPlace, stopSpan, toCheckText } from './stop-fields';
import { withWaitingStops, type ShownStop } from './waiting-stops';
import thumb from '../../../components/journal-forms/thumb.module.css';
import { EntryStateLabel } from '../../../components/send-queue/entry-state';
import styles from './stops.module.css';

/** The signed-in angler's stop still open on a day (the one "Left" closes and whose lure the catch form takes). */
export function openStopOf<T extends StopView>(stops: T[] | undefined, userId: string): T | null {
  return stops?.find((s) => !s.leftAt && s.loggedBy?.userId === userId) ?? null;
}

interface DayOfStops {
  crewId: string;
  userId: string;
  day: Pick<CompetitionDayView, 'id' | 'date' | 'eventId'>;
  timeZone: string;
  finds: FindView[];
}

/** The day's stops from the server with those still in the send queue on this phone (see waiting-stops.ts). */
export function useShownDayStops({ crewId, userId, day, timeZone, finds }: DayOfStops) {
  const query = useDayStops(crewId, day.id);
  const entries = useSendEntries(userId);
  const stops = query.data
    ? withWaitingStops(query.data, entries, { crewId, userId, day, timeZone, finds })
    : undefined;
  return { query, stops };
}

/** The open stop of the signed-in angler on a day, a stop still on the phone included. */
export function useOpenStop(day: DayOfStops): ShownStop | null {
  return openStopOf(useShownDayStops(day).stops, day.userId);
}

function timelineSummary(stops: StopView[], catches: CatchView[], loose: number): string {
  const fished = stops.filter((s) => s.catchIds.length === 0).length;
  const parts = [
    `${stops.length} stop${stops.length === 1 ? '' : 's'}`,
    `${catches.length} catch${catches.length === 1 ? '' : 'es'}`,
  ];
  if (stops.length) parts.push(`${fished} stop${fished === 1 ? '' : 's'} without a bite`);
  if (loose) parts.push(`${loose} catch${loose === 1 ? '' : 'es'} in no stop`);
  return `Day timeline: ${parts.join(', ')}.`;
}

/**
 * Stops of one competition day: the day as a timeline, the quick "Arrived here" / "Left" buttons with the
 * running caution, and every stop with what it held, to edit or delete. A stop without a fish stays on the
 * list as "fished, no bite": that is what makes the hit rates honest.
 */
export function StopsPanel({
  crewId,
  userId,
  day,
  lake,
  finds,
  catches,
  prefs,
  canWrite,
}: {
  crewId: string;
  userId: string;
  day: CompetitionDayView;
  lake: LakeView;
  finds: FindView[];
  catches: CatchView[];
  prefs: UnitPreferences;
  canWrite: boolean;
}) {
  const { query: stops, stops: shown } = useShownDayStops({ crewId, userId, day, timeZone: lake.timeZone, finds });
  useSentStopsInDayLists();
  const remove = useDeleteStop(crewId);
  const [editing, setEditing] = useState<string | null>(null);
  const [said, setSaid] = useState<string | null>(null);

  const body = () => {
    if (stops.isPending) return <LoadingState label="Loading the stops…" />;
    if (stops.isError) return <ErrorState error={stops.error} onRetry={() => stops.refetch()} />;
    const list = shown ?? [];
    const stopOfCatch = new Map(list.flatMap((s) => s.catchIds.map((id) => [id, s.id] as const)));
    const toCheck = new Set(list.flatMap((s) => s.catchesToCheck.map((c) => c.catchId)));
    const model = layoutDay(
      day,
      lake.timeZone,
      list.map((s) => ({
        id: s.id,
        label: s.findName ?? 'No find',
        arrivedAt: s.arrivedAt,
        leftAt: s.leftAt,
        anglerId: s.loggedBy?.userId ?? null,
        anglerName: s.loggedBy?.displayName ?? null,
        toCheck: s.catchesToCheck.length,
      })),
      catches.map((c) => ({
        id: c.id,
        caughtAt: c.caughtAt,
        label: formatWeight(c.weightLb, prefs.weight),
        stopId: stopOfCatch.get(c.id) ?? null,
        toCheck: toCheck.has(c.id),
      })),
      new Date(),
    );
    const loose = catches.filter((c) => !stopOfCatch.has(c.id)).length;
    const open = openStopOf(list, userId);
    return (
      <>
        <DayTimeline model={model} timeZone={lake.timeZone} summary={timelineSummary(list, catches, loose)} />
        {canWrite ? (
          <ArriveLeave
            userId={userId}
            crewId={crewId}
            day={day}
            lake={lake}
            finds={finds}
            open={open}
            unit={prefs.depth}
            onLogged={setSaid}
          />
        ) : null}
        <div role="status" aria-live="polite">
          {said ? <Text>{said}</Text> : null}
        </div>
        {list.length === 0 ? (
          <Text as="p" className={styles.muted}>
            No stops yet. Log each place you fish, bite or no bite: a find tried without a fish is what makes a hit rate
            honest.
          </Text>
        ) : (
          <ol className={styles.list} aria-label={`Stops of ${day.date}`}>
            {list.map((s) => {
              const check = toCheckText(s);
              return (
                <li key={s.id} className={styles.stop}>
                  <div className={styles.stopHead}>
                    <span>
                      <span className={styles.stopTitle}>{stopSpan(s, lake.timeZone)}</span> · {stopPlace(s)}{' '}
                      {s.onDevice ? (
                        <EntryStateLabel state={s.onDevice.state} />
                      ) : s.catchIds.length ? (
                        <Label variant="success">{s.catchIds.length} fish</Label>
                      ) : s.leftAt ? (
                        <Label variant="secondary">fished, no bite</Label>
                      ) : (
                        <Label variant="accent">here now</Label>
                      )}
                    </span>
                    {canWrite ? (
                      <span className={styles.stopActions}>
                        <Button
                          size="small"
                          leadingVisual={PencilIcon}
                          aria-label={`Edit the stop at ${clockTime(s.arrivedAt, lake.timeZone)}`}
                          onClick={() => setEditing(editing === s.id ? null : s.id)}
                        >
                          Edit
                        </Button>
                        {/* Not on the server yet (or changed on the phone only): there is nothing to delete there yet. */}
                        {s.onDevice ? null : (
                          <DeleteRecordButton
                            compact
                            record={`the stop at ${stopPlace(s)}, ${clockTime(s.arrivedAt, lake.timeZone)}`}
                            consequence={
                              s.catchIds.length
                                ? `Its ${s.catchIds.length} catch${s.catchIds.length === 1 ? '' : 'es'} stay in the journal, unattached: they are then in no stop.`
                                : 'It has no catches. The find then counts as fished only through its other stops.'
                            }
                            onDelete={async () => {
                              const answer = await remove.mutateAsync(s.id);
                              setSaid(answer.message);
                            }}
                          />
                        )}
                      </span>
                    ) : null}
                  </div>
                  <div className={styles.facts}>
                    {s.waterTempF !== null ? (
                      <span>Water {formatTemperature(s.waterTempF, prefs.temperature)}</span>
                    ) : null}
                    {s.lure ? <span>Lure {s.lure}</span> : null}
                    {s.technique ? <span>Technique {s.technique}</span> : null}
                    {s.loggedBy ? <span>Logged by {s.loggedBy.displayName}</span> : null}
                  </div>
                  {s.onDevice?.state === 'needs-you' && s.onDevice.message ? (
                    <Text as="p" size="small" className={styles.check}>
                      The server refused it: {s.onDevice.message} Use “needs you” at the top of the page to send it
                      again or discard it.
                    </Text>
                  ) : null}
                  {check ? (
                    <Text size="small" className={styles.check}>
                      <Label variant="attention">To check</Label> {check}
                    </Text>
                  ) : null}
                  {editing === s.id ? (
                    <StopEditForm
                      userId={userId}
                      crewId={crewId}
                      stop={s}
                      lake={lake}
                      finds={finds}
                      prefs={prefs}
                      onDone={() => setEditing(null)}
                    />
                  ) : null}
                </li>
              );
            })}
          </ol>
        )}
        {loose ? (
          <Text as="p" size="small" className={styles.muted}>
            {loose} catch{loose === 1 ? '' : 'es'} of this day {loose === 1 ? 'is' : 'are'} in no stop (logged outside
            every stop&rsquo;s span).
          </Text>
        ) : null}
      </>
    );
  };

  return (
    <section aria-labelledby={`stops-${day.id}`} className={`${styles.panel} ${thumb.thumb}`}>
      <Heading as="h3" id={`stops-${day.id}`} className={styles.heading}>
        Stops and the day
      </Heading>
      {body()}
    </section>
  );
}
