import type { DepthUnit, FindView, LakeView, StopView } from '@shoalbook/shared';
import { clockTime, localDateOf } from '@shoalbook/shared';
import { Button, FormControl, Select, Text, TextInput } from '@primer/react';
import { useId, useState, type ReactNode } from 'react';
import { FormError } from '../../../components/form/form-error';
import { MovingOnCaution } from '../../../components/cautions/journal-cautions';
import { PositionFromPhone } from '../../../components/journal-forms/position-from-phone';
import { ApiRequestError } from '../../../lib/api-client';
import { isClockTime } from '../../../lib/lake-time';
import { coordinateInputValue, readCoordinate } from '../../../lib/units';
import { useLogStop, useUpdateStop } from '../api/stops-api';
import { NO_FIND, STOP_SERVER_FIELDS, stopPlace } from './stop-fields';
import styles from './stops.module.css';
import thumb from '../../../components/journal-forms/thumb.module.css';

function messagesOf(failure: unknown, local: Record<string, string>, field: string): string[] {
  const server =
    failure instanceof ApiRequestError ? STOP_SERVER_FIELDS[field].flatMap((f) => failure.messagesFor(f)) : [];
  return [...(local[field] ? [local[field]] : []), ...server];
}

interface ArriveLeaveProps {
  userId: string;
  crewId: string;
  day: { id: string; date: string };
  lake: LakeView;
  finds: FindView[];
  /** The signed-in angler's stop still open on this day, if any (one still on the phone included). */
  open: StopView | null;
  /** The user's depth unit (ft or m), for the position's accuracy and the way to the nearest find. */
  unit: DepthUnit;
  /** What was logged, in a sentence (the panel says it: this form is replaced once the stop opens or closes). */
  onLogged: (message: string) => void;
  now?: () => Date;
}

/**
 * The two quick buttons of a competition day: "Arrived here" (a find, or "no find" with a position, at the
 * time shown, now on the lake clock) and, while the angler's stop is open, "Left". The running caution sits
 * beside them: leaving a stop usually means running on plane again.
 *
 * Both go into the send queue on the device first: without signal the stop opens (or closes) at once, marked
 * "waiting to send", and the queue sends it when the network is back. A refusal on the first try is shown
 * beside the fields, the values kept: the queue shows the stop opened (or closed) from the moment it holds the
 * entry, so while that first try is on the form stays as it was sent from, and it starts afresh only once the
 * stop really opened or closed.
 */
export function ArriveLeave({ userId, crewId, ...form }: ArriveLeaveProps) {
  const logStop = useLogStop(userId, crewId);
  const updateStop = useUpdateStop(userId, crewId);
  const [sentFrom, setSentFrom] = useState<{ open: StopView | null } | null>(null);
  const open = sentFrom ? sentFrom.open : form.open;
  const send = async <T,>(write: () => Promise<T>): Promise<T> => {
    setSentFrom({ open });
    try {
      return await write();
    } finally {
      setSentFrom(null);
    }
  };
  return (
    <StopButtons key={open?.id ?? 'none'} {...form} open={open} logStop={logStop} updateStop={updateStop} send={send} />
  );
}

function StopButtons({
  day,
  lake,
  finds,
  open,
  unit,
  onLogged,
  now = () => new Date(),
  logStop,
  updateStop,
  send,
}: Omit<ArriveLeaveProps, 'userId' | 'crewId'> & {
  logStop: ReturnType<typeof useLogStop>;
  updateStop: ReturnType<typeof useUpdateStop>;
  /** Runs a write with the form held as it is until the write's first try is over. */
  send: <T>(write: () => Promise<T>) => Promise<T>;
}) {
  const [find, setFind] = useState('');
  // Now on the lake clock while the day is on; a day logged afterwards has no "now" to offer.
  const nowOnDay = () => {
    const at = now();
    return localDateOf(at, lake.timeZone) === day.date ? clockTime(at, lake.timeZone) : '';
  };
  const [time, setTime] = useState(nowOnDay);
  const [lat, setLat] = useState('');
  const [lon, setLon] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const formId = useId();
  const findName = (id: string) => finds.find((f) => f.id === id)?.name ?? 'a find';
  const failure = open ? updateStop.error : logStop.error;
  const msgs = (field: string) => messagesOf(failure, errors, field);
  const status = (field: string) => (msgs(field).length ? ('error' as const) : undefined);

  const field = (key: string, label: string, input: ReactNode, caption?: string) => (
    <FormControl id={`${formId}-${key}`}>
      <FormControl.Label>{label}</FormControl.Label>
      {input}
      {caption ? <FormControl.Caption>{caption}</FormControl.Caption> : null}
      {msgs(key).length ? <FormControl.Validation variant="error">{msgs(key).join(' ')}</FormControl.Validation> : null}
    </FormControl>
  );
  const timeField = field(
    open ? 'leftAt' : 'arrivedAt',
    open ? 'Left at (lake clock)' : 'Arrived at (lake clock)',
    <TextInput
      name={open ? 'leftAt' : 'arrivedAt'}
      value={time}
      onChange={(e) => setTime(e.target.value)}
      inputMode="numeric"
      autoComplete="off"
      placeholder="HH:MM"
      className={styles.short}
      validationStatus={status(open ? 'leftAt' : 'arrivedAt')}
    />,
  );

  const arrive = async () => {
    const found: Record<string, string> = {};
    if (!isClockTime(time)) found.arrivedAt = 'A 24-hour time on the lake clock, like 07:15.';
    if (!find) found.find = 'Pick the find you stopped at, or "No find" and give the position.';
    const latN = readCoordinate(lat, 'lat');
    const lonN = readCoordinate(lon, 'lon');
    const hasPos = find === NO_FIND;
    if (hasPos) {
      if (latN === null) found.lat = 'Latitude in decimal degrees, -90 to 90.';
      if (lonN === null) found.lon = 'Longitude in decimal degrees, -180 to 180.';
    }
    setErrors(found);
    if (Object.keys(found).length) return;
    const place = find === NO_FIND ? stopPlace({ findId: null, findName: null, lat: latN, lon: lonN }) : findName(find);
    const result = await send(() =>
      logStop.mutateAsync({
        competitionDayId: day.id,
        arrivedAt: time.trim(),
        findId: find === NO_FIND ? null : find,
        ...(hasPos ? { lat: latN, lon: lonN } : {}),
        label: `Stop at ${place}, arrived ${time.trim()}`,
      }),
    );
    onLogged(
      result.kind === 'sent'
        ? `Arrived at ${stopPlace(result.answer)} at ${clockTime(result.answer.arrivedAt, lake.timeZone)}.`
        : `Arrived at ${place} at ${time.trim()}: saved on this phone, waiting to send.`,
    );
    setLat('');
    setLon('');
    setTime(nowOnDay());
  };

  const leave = async () => {
    if (!open) return;
    if (!isClockTime(time)) {
      setErrors({ leftAt: 'A 24-hour time on the lake clock, like 09:40.' });
      return;
    }
    setErrors({});
    const result = await send(() =>
      updateStop.mutateAsync({
        stopId: open.id,
        competitionDayId: day.id,
        leftAt: time.trim(),
        version: open.version,
        label: `Left ${stopPlace(open)} at ${time.trim()}`,
      }),
    );
    if (result.kind === 'sent') {
      const stop = result.answer;
      onLogged(`Left ${stopPlace(stop)} at ${clockTime(stop.leftAt!, lake.timeZone)} after ${stop.minutes} min.`);
    } else onLogged(`Left ${stopPlace(open)} at ${time.trim()}: saved on this phone, waiting to send.`);
    setTime(nowOnDay());
  };

  const submit = () => {
    // The mutation keeps its error for the fields; nothing else to do with it here.
    (open ? leave() : arrive()).catch(() => undefined);
  };

  return (
    <form
      aria-label={open ? 'Leave this stop' : 'Log a stop'}
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
      className={`${styles.editForm} ${thumb.thumb}`}
    >
      <FormError error={failure} title={open ? 'Leaving was not logged' : 'That stop was not logged'} />
      {open ? (
        <div className={styles.here}>
          <Text weight="semibold">
            Here: {stopPlace(open)} since {clockTime(open.arrivedAt, lake.timeZone)}
          </Text>
          {open.lure || open.technique ? (
            <Text size="small" className={styles.muted}>
              New catches start with {[open.lure, open.technique].filter(Boolean).join(', ')}.
            </Text>
          ) : null}
        </div>
      ) : null}
      <div className={styles.controls}>
        {open ? null : (
          <>
            {field(
              'find',
              'Where',
              <Select
                name="find"
                value={find}
                onChange={(e) => setFind(e.target.value)}
                validationStatus={status('find')}
              >
                <Select.Option value="">Pick a find…</Select.Option>
                {finds.map((f) => (
                  <Select.Option key={f.id} value={f.id}>
                    {f.name}
                  </Select.Option>
                ))}
                <Select.Option value={NO_FIND}>No find (give the position)</Select.Option>
              </Select>,
            )}
            {find === NO_FIND ? (
              <>
                {field(
                  'lat',
                  'Latitude',
                  <TextInput
                    name="lat"
                    value={lat}
                    onChange={(e) => setLat(e.target.value)}
                    inputMode="decimal"
                    autoComplete="off"
                    className={styles.short}
                    validationStatus={status('lat')}
                  />,
                  'Decimal degrees',
                )}
                {field(
                  'lon',
                  'Longitude',
                  <TextInput
                    name="lon"
                    value={lon}
                    onChange={(e) => setLon(e.target.value)}
                    inputMode="decimal"
                    autoComplete="off"
                    className={styles.short}
                    validationStatus={status('lon')}
                  />,
                )}
              </>
            ) : null}
          </>
        )}
        {timeField}
        <Button type="submit" variant="primary" loading={open ? updateStop.isPending : logStop.isPending}>
          {open ? 'Left' : 'Arrived here'}
        </Button>
      </div>
      {open ? null : (
        <PositionFromPhone
          finds={finds}
          unit={unit}
          onFix={(fix, nearest) => {
            // Within 50 m the stop is at that find; farther out it is a stop with no find at this position.
            setFind(nearest?.picked ? nearest.find.id : NO_FIND);
            setLat(coordinateInputValue(fix.lat));
            setLon(coordinateInputValue(fix.lon));
            setErrors({});
          }}
        />
      )}
      <MovingOnCaution />
    </form>
  );
}
