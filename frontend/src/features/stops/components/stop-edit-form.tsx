import type { FindView, LakeView, StopView, UnitPreferences, UpdateStopRequest } from '@shoalbook/shared';
import { clockTime } from '@shoalbook/shared';
import { Button, FormControl, Select, TextInput } from '@primer/react';
import { useId, useState, type ReactNode } from 'react';
import { FormError } from '../../../components/form/form-error';
import { ApiRequestError } from '../../../lib/api-client';
import { isClockTime } from '../../../lib/lake-time';
import { entryToF, parseOptional, parseTemperature, temperatureInputValue, UNIT_SIGNS } from '../../../lib/units';
import { useUpdateStop } from '../api/stops-api';
import { NO_FIND, STOP_SERVER_FIELDS, stopPlace } from './stop-fields';
import styles from './stops.module.css';
import thumb from '../../../components/journal-forms/thumb.module.css';

interface Values {
  find: string;
  arrivedAt: string;
  leftAt: string;
  waterTemp: string;
  lure: string;
  technique: string;
}

/**
 * Change a stop: where (a find or no find; a stop with no find keeps its position), arrival and leaving on
 * the lake clock (leaving empty = still there), water temperature, and the lure and technique its catches
 * start with. Only what changed is sent, through the send queue, with the version the stop was loaded with
 * (for a stop with changes still on the phone, the version it will have once they are sent).
 */
export function StopEditForm({
  userId,
  crewId,
  stop,
  lake,
  finds,
  prefs,
  onDone,
}: {
  userId: string;
  crewId: string;
  stop: StopView;
  lake: LakeView;
  finds: FindView[];
  prefs: UnitPreferences;
  onDone: () => void;
}) {
  const initial: Values = {
    find: stop.findId ?? NO_FIND,
    arrivedAt: clockTime(stop.arrivedAt, lake.timeZone),
    leftAt: stop.leftAt ? clockTime(stop.leftAt, lake.timeZone) : '',
    waterTemp: temperatureInputValue(stop.waterTempF, prefs.temperature),
    lure: stop.lure,
    technique: stop.technique,
  };
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const update = useUpdateStop(userId, crewId);
  const formId = useId();
  const msgs = (field: string) => [
    ...(errors[field] ? [errors[field]] : []),
    ...(update.error instanceof ApiRequestError
      ? STOP_SERVER_FIELDS[field].flatMap((f) => (update.error as ApiRequestError).messagesFor(f))
      : []),
  ];
  const status = (field: string) => (msgs(field).length ? ('error' as const) : undefined);
  const set = (key: keyof Values) => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [key]: e.target.value }));
  const field = (key: keyof Values, label: string, input: ReactNode, caption?: string) => (
    <FormControl id={`${formId}-${key}`}>
      <FormControl.Label>{label}</FormControl.Label>
      {input}
      {caption ? <FormControl.Caption>{caption}</FormControl.Caption> : null}
      {msgs(key).length ? <FormControl.Validation variant="error">{msgs(key).join(' ')}</FormControl.Validation> : null}
    </FormControl>
  );
  const text = (key: keyof Values, short = false) => (
    <TextInput
      name={key}
      value={values[key]}
      onChange={set(key)}
      autoComplete="off"
      className={short ? styles.short : undefined}
      inputMode={short ? 'numeric' : undefined}
      validationStatus={status(key)}
    />
  );

  const save = async () => {
    const found: Record<string, string> = {};
    if (!isClockTime(values.arrivedAt)) found.arrivedAt = 'A 24-hour time on the lake clock, like 07:15.';
    if (values.leftAt.trim() && !isClockTime(values.leftAt))
      found.leftAt = 'A 24-hour time on the lake clock, like 09:40, or empty while still there.';
    if (values.find === NO_FIND && stop.findId && (stop.lat === null || stop.lon === null))
      found.find = 'This stop has no position of its own: it needs its find (or delete it and log it again).';
    const temp = parseOptional(values.waterTemp, (t) => parseTemperature(t, prefs.temperature));
    if (!temp.ok) found.waterTemp = temp.error;
    setErrors(found);
    if (Object.keys(found).length || !temp.ok) return;
    const changes: UpdateStopRequest = { version: stop.version };
    if (values.find !== initial.find) changes.findId = values.find === NO_FIND ? null : values.find;
    if (values.arrivedAt !== initial.arrivedAt) changes.arrivedAt = values.arrivedAt.trim();
    if (values.leftAt !== initial.leftAt) changes.leftAt = values.leftAt.trim() ? values.leftAt.trim() : null;
    if (values.waterTemp !== initial.waterTemp) changes.waterTempF = temp.entry ? entryToF(temp.entry) : null;
    if (values.lure !== initial.lure) changes.lure = values.lure.trim();
    if (values.technique !== initial.technique) changes.technique = values.technique.trim();
    if (Object.keys(changes).length > 1) {
      // Kept on the phone first (as "left" is); without signal the list shows the change as waiting to send.
      await update.mutateAsync({
        stopId: stop.id,
        competitionDayId: stop.competitionDayId,
        label: `Changes to the stop at ${stopPlace(stop)}, ${initial.arrivedAt}`,
        ...changes,
      });
    }
    onDone();
  };

  return (
    <form
      aria-label={`Edit the stop at ${clockTime(stop.arrivedAt, lake.timeZone)}`}
      noValidate
      className={`${styles.editForm} ${thumb.thumb}`}
      onSubmit={(e) => {
        e.preventDefault();
        save().catch(() => undefined);
      }}
    >
      <FormError error={update.error} title="The stop was not changed" />
      <div className={styles.row}>
        {field(
          'find',
          'Where',
          <Select name="find" value={values.find} onChange={set('find')} validationStatus={status('find')}>
            {finds.map((f) => (
              <Select.Option key={f.id} value={f.id}>
                {f.name}
              </Select.Option>
            ))}
            <Select.Option value={NO_FIND}>No find (its own position)</Select.Option>
          </Select>,
        )}
        {field('arrivedAt', 'Arrived (lake clock)', text('arrivedAt', true))}
        {field('leftAt', 'Left (lake clock)', text('leftAt', true), 'Empty while still there')}
      </div>
      <div className={styles.row}>
        {field('waterTemp', `Water (${UNIT_SIGNS[prefs.temperature]})`, text('waterTemp', true), 'Optional')}
        {field('lure', 'Lure', text('lure'), 'Default for its catches')}
        {field('technique', 'Technique', text('technique'), 'Default for its catches')}
      </div>
      <div className={styles.stopActions}>
        <Button type="submit" variant="primary" loading={update.isPending}>
          Save stop
        </Button>
        <Button type="button" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
