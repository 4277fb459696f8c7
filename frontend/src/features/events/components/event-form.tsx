import {
  DEFAULT_EVENT_RULES,
  type EventFormat,
  type EventView,
  type LakeView,
  type UnitPreferences,
} from '@shoalbook/shared';
import { Button, FormControl, Select, Textarea } from '@primer/react';
import { useState } from 'react';
import { RulesCaution } from '../../../components/cautions/journal-cautions';
import { FormError } from '../../../components/form/form-error';
import { isApiError } from '../../../lib/api-client';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField, fieldMessages } from '../../../components/form/text-field';
import {
  entryToIn,
  entryToLb,
  lengthInputValue,
  parseLength,
  parseWeight,
  readCoordinate,
  readNumber,
  UNIT_SIGNS,
  weightHint,
  weightInputValue,
} from '../../../lib/units';
import { useSaveEvent, type EventInput } from '../api/events-api';
import { DateListField } from './date-list-field';
import styles from './event-form.module.css';

interface EventFormValues {
  lakeId: string;
  name: string;
  organiser: string;
  practiceDates: string[];
  competitionDates: string[];
  fishPerDay: string;
  minLength: string;
  deadFishPenalty: string;
  shortFishPenalty: string;
  latePenalty: string;
  format: EventFormat;
  entryFee: string;
  payout: string;
  finalPlace: string;
  fieldSize: string;
  winningWeight: string;
  cutWeight: string;
  rampLat: string;
  rampLon: string;
  notes: string;
}

type Errors = Partial<Record<string, string>>;

const today = () => new Date().toISOString().slice(0, 10);

/** Form values of an event (or of a new one, with the common-practice rules prefilled). */
export function initialEventValues(
  event: EventView | undefined,
  lakeId: string,
  prefs: UnitPreferences,
): EventFormValues {
  const rules = event?.rules ?? DEFAULT_EVENT_RULES;
  return {
    lakeId: event?.lakeId ?? lakeId,
    name: event?.name ?? '',
    organiser: event?.organiser ?? '',
    practiceDates: event?.practiceDates ?? [],
    competitionDates: event?.competitionDates ?? [],
    fishPerDay: String(rules.fishPerDay),
    minLength: lengthInputValue(rules.minLengthIn, prefs.length),
    deadFishPenalty: weightInputValue(rules.deadFishPenaltyLb, prefs.weight),
    shortFishPenalty: weightInputValue(rules.shortFishPenaltyLb, prefs.weight),
    latePenalty: weightInputValue(rules.latePenaltyLbPerMinute, prefs.weight),
    format: rules.format ?? 'team',
    entryFee: event?.entryFee != null ? String(event.entryFee) : '',
    payout: event?.payout != null ? String(event.payout) : '',
    finalPlace: event?.finalPlace != null ? String(event.finalPlace) : '',
    fieldSize: event?.field?.fieldSize != null ? String(event.field.fieldSize) : '',
    winningWeight: weightInputValue(event?.field?.winningLb ?? null, prefs.weight),
    cutWeight: weightInputValue(event?.field?.cutLb ?? null, prefs.weight),
    rampLat: event?.ramp ? String(event.ramp.lat) : '',
    rampLon: event?.ramp ? String(event.ramp.lon) : '',
    notes: event?.notes ?? '',
  };
}

/** Read the form into the request (rules converted to lb and in with the exact factors), or say what is wrong. */
export function validateEvent(v: EventFormValues, prefs: UnitPreferences): { input?: EventInput; errors: Errors } {
  const errors: Errors = {};
  if (!v.lakeId) errors.lakeId = 'Choose the lake.';
  if (!v.name.trim()) errors.name = 'Give the event a name.';
  if (v.competitionDates.length === 0) errors.competitionDates = 'Add at least one competition day.';
  const fish = readNumber(v.fishPerDay);
  if (fish === null || !Number.isInteger(fish) || fish < 1 || fish > 20)
    errors['rules.fishPerDay'] = 'A whole number of fish, 1 to 20.';
  const minLength = v.minLength.trim() ? parseLength(v.minLength, prefs.length, 'Minimum length') : null;
  if (minLength && !minLength.ok) errors['rules.minLengthIn'] = minLength.error;
  const penalty = (text: string, key: string, label: string) => {
    const parsed = parseWeight(text.trim() || '0', prefs.weight, label);
    if (!parsed.ok) errors[key] = parsed.error;
    return parsed.ok ? entryToLb(parsed.entry) : 0;
  };
  const dead = penalty(v.deadFishPenalty, 'rules.deadFishPenaltyLb', 'Dead-fish penalty');
  const short = penalty(v.shortFishPenalty, 'rules.shortFishPenaltyLb', 'Short-fish penalty');
  const late = penalty(v.latePenalty, 'rules.latePenaltyLbPerMinute', 'Late penalty per minute');
  const money = (text: string, key: string) => {
    if (!text.trim()) return null;
    const n = readNumber(text.replace(/^\$/, ''));
    if (n === null || n < 0) errors[key] = 'A positive amount, or leave it empty.';
    return n;
  };
  const entryFee = money(v.entryFee, 'entryFee');
  const payout = money(v.payout, 'payout');
  const place = v.finalPlace.trim() ? readNumber(v.finalPlace) : null;
  if (v.finalPlace.trim() && (place === null || !Number.isInteger(place) || place < 1))
    errors.finalPlace = 'A place is a whole number from 1.';
  const fieldSize = v.fieldSize.trim() ? readNumber(v.fieldSize) : null;
  if (v.fieldSize.trim() && (fieldSize === null || !Number.isInteger(fieldSize) || fieldSize < 1))
    errors['field.fieldSize'] = 'The field size is a whole number of boats or anglers, from 1.';
  if (place !== null && fieldSize !== null && place > fieldSize)
    errors.finalPlace = `A place cannot be beyond the field of ${fieldSize}.`;
  const bagWeight = (text: string, key: string, label: string) => {
    if (!text.trim()) return null;
    const parsed = parseWeight(text.trim(), prefs.weight, label);
    if (!parsed.ok) errors[key] = parsed.error;
    return parsed.ok ? entryToLb(parsed.entry) : null;
  };
  const winningLb = bagWeight(v.winningWeight, 'field.winningLb', 'Winning weight');
  const cutLb = bagWeight(v.cutWeight, 'field.cutLb', 'Cut weight');
  const ramp = readRamp(v, errors);
  const allDates = [...v.practiceDates, ...v.competitionDates];
  if (allDates.some((d) => !/^\d{4}-\d{2}-\d{2}$/.test(d))) errors.competitionDates = 'Every day needs a full date.';
  if (new Set(allDates).size !== allDates.length) errors.competitionDates = 'A date appears twice.';
  if (Object.keys(errors).length) return { errors };
  return {
    errors,
    input: {
      lakeId: v.lakeId,
      name: v.name.trim(),
      organiser: v.organiser.trim(),
      practiceDates: [...v.practiceDates].sort(),
      competitionDates: [...v.competitionDates].sort(),
      rules: {
        fishPerDay: fish!,
        minLengthIn: minLength && minLength.ok ? entryToIn(minLength.entry) : null,
        deadFishPenaltyLb: dead,
        shortFishPenaltyLb: short,
        latePenaltyLbPerMinute: late,
        format: v.format,
      },
      field: { fieldSize, winningLb, cutLb },
      ramp,
      entryFee,
      payout,
      finalPlace: place,
      notes: v.notes.trim(),
    },
  };
}

/** The ramp's two coordinates, both or neither (null clears it); a problem goes into `errors`. */
function readRamp(v: EventFormValues, errors: Errors): { lat: number; lon: number } | null {
  if (!v.rampLat.trim() && !v.rampLon.trim()) return null;
  const lat = readCoordinate(v.rampLat, 'lat');
  const lon = readCoordinate(v.rampLon, 'lon');
  if (lat === null) errors['ramp.lat'] = 'Latitude in decimal degrees, -90 to 90 (both or neither).';
  if (lon === null) errors['ramp.lon'] = 'Longitude in decimal degrees, -180 to 180 (both or neither).';
  return lat !== null && lon !== null ? { lat, lon } : null;
}

export function EventForm({
  crewId,
  lakes,
  event,
  lakeId = '',
  prefs,
  onSaved,
  onCancel,
}: {
  crewId: string;
  lakes: LakeView[];
  event?: EventView;
  lakeId?: string;
  prefs: UnitPreferences;
  onSaved: (event: EventView) => void;
  onCancel?: () => void;
}) {
  const [values, setValues] = useState(() => initialEventValues(event, lakeId || lakes[0]?.id || '', prefs));
  const [errors, setErrors] = useState<Errors>({});
  const save = useSaveEvent(crewId, event?.id);
  const set = (key: keyof EventFormValues) => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [key]: e.target.value }));
  const field = (key: keyof EventFormValues, serverName: string = key) => ({
    name: serverName,
    value: values[key] as string,
    onChange: set(key),
    serverError: save.error,
    clientError: errors[serverName],
  });
  const submit = () => {
    const { input, errors: found } = validateEvent(values, prefs);
    setErrors(found);
    if (input) save.mutate(event ? { ...input, version: event.version } : input, { onSuccess: onSaved });
  };
  const lakeMessages = [...(errors.lakeId ? [errors.lakeId] : []), ...fieldMessages(save.error, 'lakeId')];
  const wSign = prefs.weight === 'lb-oz' ? 'lb-oz' : UNIT_SIGNS[prefs.weight];

  return (
    <FormStack onSubmit={submit} label={event ? `Edit ${event.name}` : 'New event'}>
      <FormError
        error={save.error}
        title={
          isApiError(save.error, 409, 'day_in_use')
            ? 'The dates were not changed: a day you removed still has records'
            : undefined
        }
      />
      <FormControl required>
        <FormControl.Label>Lake</FormControl.Label>
        <Select
          name="lakeId"
          value={values.lakeId}
          onChange={set('lakeId')}
          block
          validationStatus={lakeMessages.length ? 'error' : undefined}
        >
          {lakes.map((lake) => (
            <Select.Option key={lake.id} value={lake.id}>
              {lake.name}
            </Select.Option>
          ))}
        </Select>
        {lakeMessages.length ? (
          <FormControl.Validation variant="error">{lakeMessages.join(' ')}</FormControl.Validation>
        ) : null}
      </FormControl>
      <TextField label="Event name" required autoComplete="off" {...field('name')} />
      <TextField label="Organiser" caption="Club, trail or circuit, in your words." {...field('organiser')} />
      <DateListField
        label="Practice days"
        caption="The days you pre-fish; finds can be tied to them."
        dates={values.practiceDates}
        onChange={(practiceDates) => setValues((v) => ({ ...v, practiceDates }))}
        messages={[
          ...(errors.practiceDates ? [errors.practiceDates] : []),
          ...fieldMessages(save.error, 'practiceDates'),
        ]}
        firstDefault={today()}
      />
      <DateListField
        label="Competition days"
        caption="Each gets its own catches and weigh-in."
        dates={values.competitionDates}
        onChange={(competitionDates) => setValues((v) => ({ ...v, competitionDates }))}
        messages={[
          ...(errors.competitionDates ? [errors.competitionDates] : []),
          ...fieldMessages(save.error, 'competitionDates'),
        ]}
        firstDefault={values.practiceDates.length ? values.practiceDates[values.practiceDates.length - 1] : today()}
      />
      <fieldset className={styles.fieldset}>
        <legend className={styles.legend}>Rules of this event</legend>
        <RulesCaution />
        <div className={styles.pair}>
          <TextField label="Fish counted per day" inputMode="numeric" {...field('fishPerDay', 'rules.fishPerDay')} />
          <TextField
            label={`Minimum length (${UNIT_SIGNS[prefs.length]})`}
            inputMode="decimal"
            caption="Leave empty when the event sets none."
            {...field('minLength', 'rules.minLengthIn')}
          />
          <TextField
            label={`Dead-fish penalty (${wSign})`}
            caption={weightHint(prefs.weight)}
            {...field('deadFishPenalty', 'rules.deadFishPenaltyLb')}
          />
          <TextField
            label={`Short-fish penalty (${wSign})`}
            caption={weightHint(prefs.weight)}
            {...field('shortFishPenalty', 'rules.shortFishPenaltyLb')}
          />
          <TextField
            label={`Late penalty per minute (${wSign})`}
            caption="Taken off for each minute late at check-in."
            {...field('latePenalty', 'rules.latePenaltyLbPerMinute')}
          />
          <FormControl>
            <FormControl.Label>Format</FormControl.Label>
            <Select name="rules.format" value={values.format} onChange={set('format')} block>
              <Select.Option value="team">Team: one bag per boat, both anglers’ fish</Select.Option>
              <Select.Option value="individual">Individual: a bag per angler</Select.Option>
            </Select>
          </FormControl>
        </div>
      </fieldset>
      <div className={styles.pair}>
        <TextField label="Entry fee" inputMode="decimal" {...field('entryFee')} />
        <TextField label="Payout won" inputMode="decimal" {...field('payout')} />
        <TextField
          label="Final place"
          inputMode="numeric"
          caption="Fill in after the last weigh-in."
          {...field('finalPlace')}
        />
      </div>
      <fieldset className={styles.fieldset}>
        <legend className={styles.legend}>The field (from the results sheet)</legend>
        <div className={styles.pair}>
          <TextField
            label="Field size"
            inputMode="numeric"
            caption="Boats or anglers entered."
            {...field('fieldSize', 'field.fieldSize')}
          />
          <TextField
            label={`Winning weight (${wSign})`}
            caption={weightHint(prefs.weight)}
            {...field('winningWeight', 'field.winningLb')}
          />
          <TextField
            label={`Cut weight (${wSign})`}
            caption="The weight that made the cut or the money."
            {...field('cutWeight', 'field.cutLb')}
          />
        </div>
      </fieldset>
      <fieldset className={styles.fieldset}>
        <legend className={styles.legend}>Launch and check-in ramp</legend>
        <p className={styles.caption}>
          On competition days the check-in clock works out from here when to start back. Decimal degrees, as the
          chartplotter or the phone shows them.
        </p>
        <div className={styles.pair}>
          <TextField label="Ramp latitude" inputMode="decimal" autoComplete="off" {...field('rampLat', 'ramp.lat')} />
          <TextField label="Ramp longitude" inputMode="decimal" autoComplete="off" {...field('rampLon', 'ramp.lon')} />
        </div>
      </fieldset>
      <FormControl>
        <FormControl.Label>Notes</FormControl.Label>
        <Textarea name="notes" value={values.notes} onChange={set('notes')} block rows={3} />
      </FormControl>
      <FormActions>
        <Button type="submit" variant="primary" loading={save.isPending}>
          {event ? 'Save event' : 'Add event'}
        </Button>
        {onCancel ? <Button onClick={onCancel}>Cancel</Button> : null}
      </FormActions>
    </FormStack>
  );
}
