import type { UnitPreferences } from '@shoalbook/shared';
import { Button, FormControl, Heading, Text, Textarea } from '@primer/react';
import { useState } from 'react';
import { EmptyState, ErrorState, LoadingState } from '../../../components/feedback/query-states';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { isStaleVersion, StaleVersionBanner } from '../../../components/journal-forms/stale-version-banner';
import { dayLabel } from '../../../lib/lake-time';
import type { PracticeDayView } from '../../../lib/journal-types';
import {
  formatTemperature,
  parseOptional,
  parseTemperature,
  temperatureInputValue,
  UNIT_SIGNS,
} from '../../../lib/units';
import { useEventDays, useUpdatePracticeDay } from '../api/events-api';
import styles from './practice-days-panel.module.css';

/** The practice days of an event with what the angler noted on each (conditions, what the lake looked like). */
export function PracticeDaysPanel({
  crewId,
  eventId,
  prefs,
  canWrite,
}: {
  crewId: string;
  eventId: string;
  prefs: UnitPreferences;
  canWrite: boolean;
}) {
  const days = useEventDays(crewId, eventId);
  // Reloading after a conflict remounts the forms with the latest notes; a successful save keeps them as typed.
  const [reloads, setReloads] = useState(0);
  if (days.isPending) return <LoadingState label="Loading the practice days…" />;
  if (days.isError) return <ErrorState error={days.error} onRetry={() => days.refetch()} />;
  const practice = days.data.practice;
  return (
    <section aria-labelledby="practice-days" className={styles.panel}>
      <Heading as="h3" id="practice-days" className={styles.heading}>
        Practice days
      </Heading>
      {practice.length === 0 ? (
        <EmptyState title="No practice days">Add practice dates to the event to keep notes for each day.</EmptyState>
      ) : (
        <ul className={styles.list}>
          {practice.map((day) => (
            <li key={day.id} className={styles.day}>
              {canWrite ? (
                <PracticeDayForm
                  key={`${day.id}:${reloads}`}
                  crewId={crewId}
                  day={day}
                  prefs={prefs}
                  onReload={() => void days.refetch().then(() => setReloads((n) => n + 1))}
                />
              ) : (
                <PracticeDayNotes day={day} prefs={prefs} />
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

function PracticeDayNotes({ day, prefs }: { day: PracticeDayView; prefs: UnitPreferences }) {
  return (
    <>
      <Text as="p" weight="semibold" className={styles.date}>
        {dayLabel(day.date)}
        {day.waterTempF !== null ? ` · water ${formatTemperature(day.waterTempF, prefs.temperature)}` : ''}
      </Text>
      <Text as="p" className={styles.notes}>
        {day.notes || 'No notes for this day.'}
      </Text>
    </>
  );
}

/** Notes and water temperature of one practice day; saved with the version it was loaded with. */
export function PracticeDayForm({
  crewId,
  day,
  prefs,
  onReload,
}: {
  crewId: string;
  day: PracticeDayView;
  prefs: UnitPreferences;
  onReload: () => void;
}) {
  const [notes, setNotes] = useState(day.notes);
  const [waterTemp, setWaterTemp] = useState(() =>
    day.entered?.waterTemp && day.entered.waterTemp.unit === prefs.temperature
      ? String(day.entered.waterTemp.value)
      : temperatureInputValue(day.waterTempF, prefs.temperature),
  );
  const [startTemp] = useState(waterTemp);
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const update = useUpdatePracticeDay(crewId);
  const label = dayLabel(day.date);

  const submit = () => {
    const temp = parseOptional(waterTemp, (t) => parseTemperature(t, prefs.temperature));
    if (!temp.ok) {
      setError(temp.error);
      return;
    }
    setError(null);
    update.mutate(
      {
        dayId: day.id,
        version: day.version,
        notes: notes.trim(),
        ...(waterTemp.trim() !== startTemp.trim() ? { waterTemp: temp.entry } : {}),
      },
      { onSuccess: () => setSaved(true) },
    );
  };
  const stale = isStaleVersion(update.error);
  return (
    <FormStack onSubmit={submit} label={`Practice day ${label}`}>
      <Text as="p" weight="semibold" className={styles.date}>
        {label}
      </Text>
      <StaleVersionBanner error={update.error} what="practice day" onReload={onReload} />
      {stale ? null : <FormError error={update.error} title="The notes were not saved" />}
      <FormControl>
        <FormControl.Label>Notes for {label}</FormControl.Label>
        <Textarea
          name="notes"
          value={notes}
          onChange={(e) => {
            setSaved(false);
            setNotes(e.target.value);
          }}
          block
          rows={3}
          placeholder="Wind, water colour and level, where the bait was, what the sonar showed"
        />
      </FormControl>
      <div className={styles.temp}>
        <TextField
          label={`Water temperature (${UNIT_SIGNS[prefs.temperature]})`}
          name="waterTemp"
          inputMode="decimal"
          value={waterTemp}
          onChange={(e) => {
            setSaved(false);
            setWaterTemp(e.target.value);
          }}
          clientError={error}
          serverError={update.error}
        />
      </div>
      <FormActions>
        <Button type="submit" loading={update.isPending} disabled={stale}>
          Save notes for {label}
        </Button>
        <div role="status" aria-live="polite">
          {saved ? <Text size="small">Saved.</Text> : null}
        </div>
      </FormActions>
    </FormStack>
  );
}
