import {
  FATES,
  SPECIES_LABELS,
  type Fate,
  type FindView,
  type LakeView,
  type Species,
  type UnitPreferences,
} from '@shoalbook/shared';
import { Button, Checkbox, FormControl, Label, Select, Text, TextInput } from '@primer/react';
import { useEffect, useId, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';
import { v7 as uuidv7 } from 'uuid';
import { FishCareCaution } from '../../../components/cautions/journal-cautions';
import { FormError } from '../../../components/form/form-error';
import { PhotoField } from '../../../components/journal-forms/photo-field';
import { PositionFromPhone } from '../../../components/journal-forms/position-from-phone';
import { ApiRequestError } from '../../../lib/api-client';
import { crewApiPath } from '../../../lib/journal-keys';
import { queueWrite, sendQueue } from '../../../lib/send-queue';
import { clockTime, dayLabel, isClockTime } from '../../../lib/lake-time';
import type { CatchWithSky } from '../../../lib/journal-types';
import {
  coordinateInputValue,
  entryToLb,
  formatWeight,
  parseDepth,
  parseLength,
  parseOptional,
  parseTemperature,
  parseWeight,
  readCoordinate,
  stepWeight,
  UNIT_SIGNS,
  WEIGHT_STEPS,
  weightHint,
} from '../../../lib/units';
import type { CatchInput } from '../api/catches-api';
import { FATE_LABELS } from './catch-labels';
import { findOptionLabel, matchFind } from './catch-values';
import { recentSpecies, rememberSpecies, speciesByRecentUse } from './recent-species';
import thumb from '../../../components/journal-forms/thumb.module.css';
import { WaitingToSendNote } from '../../../components/send-queue/entry-state';
import styles from './catch-entry-form.module.css';

interface Values {
  caughtAt: string;
  species: Species;
  weight: string;
  length: string;
  find: string;
  lat: string;
  lon: string;
  fate: Fate;
  lure: string;
  technique: string;
  depth: string;
  waterTemp: string;
}

/** Server field names that belong to each input (the contract accepts canonical or entered forms). */
const SERVER_FIELDS: Record<string, string[]> = {
  caughtAt: ['caughtAt'],
  species: ['species'],
  weight: ['weight', 'weight.value', 'weight.ounces', 'weightLb'],
  length: ['length', 'length.value', 'lengthIn'],
  find: ['findId', 'competitionDayId'],
  lat: ['lat'],
  lon: ['lon'],
  fate: ['fate'],
  lure: ['lure'],
  technique: ['technique'],
  depth: ['depth', 'depth.value', 'depthFt'],
  waterTemp: ['waterTemp', 'waterTemp.value', 'waterTempF'],
};

/**
 * Logging a catch between casts, by keyboard alone: focus starts on the time (now, on the lake's clock),
 * Enter logs it from any field, and the form clears for the next fish with focus back on the time.
 * Species, lure, technique and water temperature stay as they were: they seldom change fish to fish.
 *
 * The catch goes into the send queue on the device first. When the server answers at once, the form says
 * "Logged" (or shows a refusal beside the fields, values kept); without signal it says "waiting to send" and
 * clears for the next fish, and the queue sends it when the network is back.
 */
export function CatchEntryForm({
  userId,
  crewId,
  day,
  lake,
  finds,
  prefs,
  stopDefaults = null,
  now = () => new Date(),
}: {
  userId: string;
  crewId: string;
  day: { id: string; date: string };
  lake: LakeView;
  finds: FindView[];
  prefs: UnitPreferences;
  /**
   * The angler's open stop: its find, lure and technique fill the form when the stop opens and after each fish
   * (the catch keeps its own once logged; the stop's are only the default).
   */
  stopDefaults?: { stopId: string; findId: string | null; place: string; lure: string; technique: string } | null;
  /** The clock (replaceable in tests). */
  now?: () => Date;
}) {
  const stopFind = () => {
    const find = stopDefaults?.findId ? finds.find((f) => f.id === stopDefaults.findId) : undefined;
    return find ? findOptionLabel(find, prefs) : '';
  };
  const fresh = (keep?: Values): Values => ({
    caughtAt: clockTime(now(), lake.timeZone),
    species: keep?.species ?? recentSpecies()[0] ?? 'largemouth',
    weight: '',
    length: '',
    find: stopFind(),
    lat: '',
    lon: '',
    fate: 'weighed',
    lure: keep?.lure ?? stopDefaults?.lure ?? '',
    technique: keep?.technique ?? stopDefaults?.technique ?? '',
    depth: '',
    waterTemp: keep?.waterTemp ?? '',
  });
  const [values, setValues] = useState<Values>(() => fresh());
  // Read when the form opens and after each fish, so the list does not reorder under the angler's thumb.
  const [speciesOrder, setSpeciesOrder] = useState(() => speciesByRecentUse(recentSpecies()));
  // A newly opened (or edited) stop brings its defaults (state adjusted while rendering, as React advises, not in an effect).
  const defaultsKey = stopDefaults
    ? [stopDefaults.stopId, stopDefaults.findId, stopDefaults.lure, stopDefaults.technique].join('\n')
    : null;
  const [defaultsOf, setDefaultsOf] = useState({ key: defaultsKey, find: stopFind() });
  if (defaultsKey !== defaultsOf.key) {
    const find = stopFind();
    setDefaultsOf({ key: defaultsKey, find });
    setValues((v) =>
      stopDefaults
        ? {
            ...v,
            find: find || v.find,
            lure: stopDefaults.lure || v.lure,
            technique: stopDefaults.technique || v.technique,
          }
        : // The stop closed: its find no longer applies (lure and technique stay, as between fish).
          { ...v, find: v.find === defaultsOf.find ? '' : v.find },
    );
  }
  const [byCoordinates, setByCoordinates] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [logged, setLogged] = useState<CatchWithSky | null>(null);
  const [photo, setPhoto] = useState<{ photoId: string | null; busy: boolean }>({ photoId: null, busy: false });
  // A new key clears the photo field (its file input) and the position's message for the next fish.
  const [nextFishKey, setNextFishKey] = useState(0);
  const [sending, setSending] = useState(false);
  /** The server's refusal of the catch still in the form, or a device that could not store it. */
  const [failure, setFailure] = useState<Error | null>(null);
  const [waiting, setWaiting] = useState<{ key: string; label: string } | null>(null);
  const waitingKey = useRef<string | null>(null);
  useEffect(
    () =>
      sendQueue.onSent((entry, answer) => {
        if (entry.key !== waitingKey.current) return;
        waitingKey.current = null;
        setWaiting(null);
        setLogged(answer as CatchWithSky);
      }),
    [],
  );
  const timeRef = useRef<HTMLInputElement>(null);
  const listId = useId();
  const formId = useId();

  const findName = (id: string | null) => finds.find((f) => f.id === id)?.name ?? 'a find';

  const serverMessages = (field: string) =>
    failure instanceof ApiRequestError ? SERVER_FIELDS[field].flatMap((name) => failure.messagesFor(name)) : [];
  const messages = (field: string) => [...(errors[field] ? [errors[field]] : []), ...serverMessages(field)];

  const set = (key: keyof Values) => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [key]: e.target.value }));

  const build = (): { input?: CatchInput; errors: Record<string, string> } => {
    const found: Record<string, string> = {};
    if (!isClockTime(values.caughtAt)) found.caughtAt = 'A 24-hour time on the lake clock, like 07:42.';
    const weight = parseWeight(values.weight, prefs.weight);
    if (!weight.ok) found.weight = weight.error;
    const length = parseOptional(values.length, (t) => parseLength(t, prefs.length));
    if (!length.ok) found.length = length.error;
    const depth = parseOptional(values.depth, (t) => parseDepth(t, prefs.depth));
    if (!depth.ok) found.depth = depth.error;
    const temp = parseOptional(values.waterTemp, (t) => parseTemperature(t, prefs.temperature));
    if (!temp.ok) found.waterTemp = temp.error;
    let where: Pick<CatchInput, 'findId' | 'lat' | 'lon'> = {};
    if (byCoordinates) {
      const lat = readCoordinate(values.lat, 'lat');
      const lon = readCoordinate(values.lon, 'lon');
      if (lat === null) found.lat = 'Latitude in decimal degrees, -90 to 90.';
      if (lon === null) found.lon = 'Longitude in decimal degrees, -180 to 180.';
      if (lat !== null && lon !== null) where = { lat, lon };
    } else if (values.find.trim()) {
      const match = matchFind(values.find, finds, prefs);
      if (!match) found.find = 'No find by that name: pick one from the list, or leave the field empty.';
      else where = { findId: match.id };
    }
    if (Object.keys(found).length || !weight.ok || !length.ok || !depth.ok || !temp.ok) return { errors: found };
    return {
      errors: found,
      input: {
        competitionDayId: day.id,
        caughtAt: values.caughtAt.trim(),
        ...where,
        species: values.species,
        weight: weight.entry,
        length: length.entry,
        lure: values.lure.trim(),
        technique: values.technique.trim(),
        depth: depth.entry,
        waterTemp: temp.entry,
        fate: values.fate,
        ...(photo.photoId ? { photoId: photo.photoId } : {}),
      },
    };
  };

  const clearForNext = () => {
    rememberSpecies(values.species);
    setSpeciesOrder(speciesByRecentUse(recentSpecies()));
    setValues((v) => fresh(v));
    setPhoto({ photoId: null, busy: false });
    setNextFishKey((k) => k + 1);
    timeRef.current?.focus();
  };

  const submit = async () => {
    if (sending || photo.busy) return;
    const { input, errors: found } = build();
    setErrors(found);
    if (!input) return;
    setSending(true);
    setFailure(null);
    const recordId = uuidv7();
    const label = `${formatWeight(entryToLb(input.weight), prefs.weight)} ${SPECIES_LABELS[input.species].toLowerCase()} at ${input.caughtAt}`;
    try {
      const { stored, first } = await queueWrite({
        userId,
        crewId,
        kind: 'log-catch',
        method: 'POST',
        path: crewApiPath(crewId, '/catches'),
        body: { ...input, id: recordId },
        recordId,
        label,
        scope: day.id,
      });
      const outcome = await first;
      if (outcome.kind === 'sent') {
        setWaiting(null);
        setLogged(outcome.answer as CatchWithSky);
        clearForNext();
      } else if (outcome.kind === 'refused') {
        // The values are still in the form: show the refusal beside them instead of keeping a second copy.
        await sendQueue.discard(stored.seq!);
        setFailure(outcome.failure as ApiRequestError);
      } else {
        waitingKey.current = stored.key;
        setLogged(null);
        setWaiting({ key: stored.key, label });
        clearForNext();
      }
    } catch (error) {
      setFailure(error instanceof Error ? error : new Error(String(error)));
    } finally {
      setSending(false);
    }
  };

  // Enter logs the catch from any field, selects and the checkbox included (browsers submit only from text inputs).
  const onKeyDown = (event: KeyboardEvent<HTMLFormElement>) => {
    const target = event.target as HTMLElement;
    if (event.key === 'Enter' && (target.tagName === 'SELECT' || (target as HTMLInputElement).type === 'checkbox')) {
      event.preventDefault();
      void submit();
    }
  };

  /** One labelled field; `after` sits below it (outside the FormControl, which wires only its own input). */
  const field = (key: keyof Values, label: string, input: ReactNode, caption?: ReactNode, after?: ReactNode) => {
    const msgs = messages(key);
    const control = (
      <FormControl key={key} id={`${formId}-${key}`}>
        <FormControl.Label>{label}</FormControl.Label>
        {input}
        {caption ? <FormControl.Caption>{caption}</FormControl.Caption> : null}
        {msgs.length ? <FormControl.Validation variant="error">{msgs.join(' ')}</FormControl.Validation> : null}
      </FormControl>
    );
    return after ? (
      <div key={key} className={styles.withAfter}>
        {control}
        {after}
      </div>
    ) : (
      control
    );
  };
  const status = (key: string) => (messages(key).length ? ('error' as const) : undefined);
  const weightEcho = (() => {
    const parsed = parseWeight(values.weight, prefs.weight);
    if (!parsed.ok || prefs.weight === 'lb') return null;
    return `= ${formatWeight(entryToLb(parsed.entry), 'lb')}`;
  })();

  return (
    <form
      className={`${styles.form} ${thumb.thumb}`}
      aria-label={`Log a catch on ${dayLabel(day.date)}`}
      noValidate
      onKeyDown={onKeyDown}
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
    >
      <FishCareCaution />
      <FormError error={failure} title="That catch was not logged" />
      <div className={styles.row}>
        {field(
          'caughtAt',
          'Time (lake clock)',
          <TextInput
            ref={timeRef}
            name="caughtAt"
            value={values.caughtAt}
            onChange={set('caughtAt')}
            autoFocus
            inputMode="numeric"
            autoComplete="off"
            placeholder="07:42"
            className={styles.short}
            validationStatus={status('caughtAt')}
          />,
          lake.timeZone.replace(/_/g, ' '),
        )}
        {field(
          'species',
          'Species',
          <Select
            name="species"
            value={values.species}
            onChange={(e) => setValues((v) => ({ ...v, species: e.target.value as Species }))}
            validationStatus={status('species')}
          >
            {speciesOrder.map((s) => (
              <Select.Option key={s} value={s}>
                {SPECIES_LABELS[s]}
              </Select.Option>
            ))}
          </Select>,
        )}
        {field(
          'weight',
          `Weight (${prefs.weight === 'lb-oz' ? 'lb-oz' : UNIT_SIGNS[prefs.weight]})`,
          <TextInput
            name="weight"
            value={values.weight}
            onChange={set('weight')}
            inputMode="decimal"
            autoComplete="off"
            className={styles.short}
            validationStatus={status('weight')}
          />,
          weightEcho ?? weightHint(prefs.weight),
          <WeightSteppers
            steps={WEIGHT_STEPS[prefs.weight]}
            onStep={(by) => setValues((v) => ({ ...v, weight: stepWeight(v.weight, prefs.weight, by) ?? v.weight }))}
          />,
        )}
        {field(
          'length',
          `Length (${UNIT_SIGNS[prefs.length]})`,
          <TextInput
            name="length"
            value={values.length}
            onChange={set('length')}
            inputMode="decimal"
            autoComplete="off"
            className={styles.short}
            validationStatus={status('length')}
          />,
          'Optional',
        )}
      </div>
      <div className={styles.row}>
        {byCoordinates ? (
          <>
            {field(
              'lat',
              'Latitude',
              <TextInput
                name="lat"
                value={values.lat}
                onChange={set('lat')}
                inputMode="decimal"
                autoComplete="off"
                validationStatus={status('lat')}
              />,
            )}
            {field(
              'lon',
              'Longitude',
              <TextInput
                name="lon"
                value={values.lon}
                onChange={set('lon')}
                inputMode="decimal"
                autoComplete="off"
                validationStatus={status('lon')}
              />,
              'Matched to the nearest find within 50 m',
            )}
          </>
        ) : (
          field(
            'find',
            'Find (type to filter)',
            <TextInput
              name="find"
              value={values.find}
              onChange={set('find')}
              list={listId}
              autoComplete="off"
              block
              validationStatus={status('find')}
            />,
            finds.length
              ? 'Optional: the practice find it came from'
              : 'No finds on this lake yet; leave it empty or use coordinates',
          )
        )}
        <FormControl>
          <Checkbox checked={byCoordinates} onChange={(e) => setByCoordinates(e.target.checked)} />
          <FormControl.Label>Attribute from coordinates</FormControl.Label>
        </FormControl>
        {field(
          'fate',
          'Fate',
          <Select
            name="fate"
            value={values.fate}
            onChange={(e) => setValues((v) => ({ ...v, fate: e.target.value as Fate }))}
            validationStatus={status('fate')}
          >
            {FATES.map((f) => (
              <Select.Option key={f} value={f}>
                {FATE_LABELS[f]}
              </Select.Option>
            ))}
          </Select>,
        )}
      </div>
      <PositionFromPhone
        key={`position-${nextFishKey}`}
        finds={finds}
        unit={prefs.depth}
        onFix={(fix) => {
          // The server attributes a catch by coordinates to the nearest find within 50 m, as the message says.
          setByCoordinates(true);
          setValues((v) => ({ ...v, lat: coordinateInputValue(fix.lat), lon: coordinateInputValue(fix.lon) }));
        }}
      />
      <div className={styles.row}>
        {field(
          'lure',
          'Lure',
          <TextInput
            name="lure"
            value={values.lure}
            onChange={set('lure')}
            autoComplete="off"
            validationStatus={status('lure')}
          />,
          stopDefaults?.lure ? `Default of the stop at ${stopDefaults.place}` : undefined,
        )}
        {field(
          'technique',
          'Technique',
          <TextInput
            name="technique"
            value={values.technique}
            onChange={set('technique')}
            autoComplete="off"
            validationStatus={status('technique')}
          />,
          stopDefaults?.technique ? `Default of the stop at ${stopDefaults.place}` : undefined,
        )}
        {field(
          'depth',
          `Depth (${UNIT_SIGNS[prefs.depth]})`,
          <TextInput
            name="depth"
            value={values.depth}
            onChange={set('depth')}
            inputMode="decimal"
            autoComplete="off"
            className={styles.short}
            validationStatus={status('depth')}
          />,
        )}
        {field(
          'waterTemp',
          `Water (${UNIT_SIGNS[prefs.temperature]})`,
          <TextInput
            name="waterTemp"
            value={values.waterTemp}
            onChange={set('waterTemp')}
            inputMode="decimal"
            autoComplete="off"
            className={styles.short}
            validationStatus={status('waterTemp')}
          />,
        )}
      </div>
      <PhotoField
        key={`photo-${nextFishKey}`}
        crewId={crewId}
        label="Photo (optional)"
        photoId={photo.photoId}
        onChange={setPhoto}
        describe="Photo of this catch"
      />
      <datalist id={listId}>
        {finds.map((f) => (
          <option key={f.id} value={findOptionLabel(f, prefs)} />
        ))}
      </datalist>
      <div className={`${styles.actions} ${thumb.saveBar}`}>
        <Button type="submit" variant="primary" loading={sending} disabled={photo.busy}>
          Log catch
        </Button>
        <Text size="small" className={styles.hint}>
          Enter logs it from any field; the form clears for the next fish. Lure, technique and water stay.
        </Text>
      </div>
      <div role="status" aria-live="polite" className={styles.logged}>
        {waiting ? (
          <WaitingToSendNote size="medium">
            Saved on this phone: {waiting.label}. It goes to the server by itself once there is signal.
          </WaitingToSendNote>
        ) : logged ? (
          <>
            <Text>
              Logged {formatWeight(logged.weightLb, prefs.weight)} {SPECIES_LABELS[logged.species].toLowerCase()} at{' '}
              {clockTime(logged.caughtAt, lake.timeZone)}
              {logged.findId
                ? logged.attributionDistanceM !== null
                  ? `, attributed to ${logged.findName ?? findName(logged.findId)} (${Math.round(logged.attributionDistanceM)} m away)`
                  : `, from ${logged.findName ?? findName(logged.findId)}`
                : byCoordinates || logged.lat !== null
                  ? ', no find within the radius'
                  : ''}
              .
            </Text>{' '}
            {logged.weightFlagged ? (
              <Label variant="attention">Check this weight: it does not fit the length</Label>
            ) : null}
          </>
        ) : null}
      </div>
    </form>
  );
}

/**
 * Big minus and plus buttons for a wet thumb: a coarse and a fine step each way. Out of the tab order, since
 * the keyboard types the weight; a step from a weight that does not read leaves it for the angler to fix.
 */
function WeightSteppers({
  steps,
  onStep,
}: {
  steps: readonly { by: number; label: string }[];
  onStep: (by: number) => void;
}) {
  const buttons = [
    ...steps.map((s) => ({ by: -s.by, text: `−${s.label}`, name: `Weight down ${s.label}` })),
    ...[...steps].reverse().map((s) => ({ by: s.by, text: `+${s.label}`, name: `Weight up ${s.label}` })),
  ];
  return (
    <div className={styles.steppers} role="group" aria-label="Weight steps">
      {buttons.map((b) => (
        <Button key={b.name} type="button" size="large" tabIndex={-1} aria-label={b.name} onClick={() => onStep(b.by)}>
          {b.text}
        </Button>
      ))}
    </div>
  );
}
