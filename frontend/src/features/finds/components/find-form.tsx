import {
  FIND_KINDS,
  FIND_KIND_LABELS,
  FIND_SUB_KINDS,
  FOUND_HOW,
  FOUND_HOW_LABELS,
  FREQUENCY_KHZ,
  HARDNESS_GRADES,
  VEGETATION_DENSITIES,
  type EventView,
  type FindKind,
  type FoundHow,
  type HardnessGrade,
  type LakeView,
  type UnitPreferences,
  type VegetationDensity,
} from '@shoalbook/shared';
import { Button, Checkbox, FormControl, Select, Text, Textarea } from '@primer/react';
import { useId, useState, type ReactNode } from 'react';
import { OnPlaneCaution } from '../../../components/cautions/journal-cautions';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField, fieldMessages } from '../../../components/form/text-field';
import { WaitingToSendNote } from '../../../components/send-queue/entry-state';
import { clockTime, localTimeOn, localDate, isClockTime } from '../../../lib/lake-time';
import type { FindWithSky } from '../../../lib/journal-types';
import {
  depthInputValue,
  parseDepth,
  parseOptional,
  parseTemperature,
  readCoordinate,
  readNumber,
  temperatureInputValue,
  UNIT_SIGNS,
} from '../../../lib/units';
import { uploadPhoto, useSaveFind, type FindInput } from '../api/finds-api';
import { HARDNESS_LABELS, VEGETATION_LABELS } from './find-labels';
import styles from './find-form.module.css';

type Values = Record<
  | 'lakeId'
  | 'eventId'
  | 'practiceDate'
  | 'name'
  | 'markedDate'
  | 'markedTime'
  | 'lat'
  | 'lon'
  | 'depth'
  | 'kind'
  | 'subKind'
  | 'hardness'
  | 'vegetationDensity'
  | 'fishMarked'
  | 'frequencyKhz'
  | 'foundHow'
  | 'waterTemp'
  | 'notes',
  string
> & { baitSeen: boolean; photoId: string | null };

function initialValues(
  find: FindWithSky | undefined,
  lake: LakeView | undefined,
  defaults: { lakeId?: string; eventId?: string },
  prefs: UnitPreferences,
): Values {
  const zone = lake?.timeZone ?? 'UTC';
  return {
    lakeId: find?.lakeId ?? defaults.lakeId ?? lake?.id ?? '',
    eventId: find?.eventId ?? defaults.eventId ?? '',
    practiceDate: find?.practiceDate ?? '',
    name: find?.name ?? '',
    markedDate: find?.markedAt ? localDate(find.markedAt, zone) : '',
    markedTime: find?.markedAt ? clockTime(find.markedAt, zone) : '',
    lat: find?.lat != null ? String(find.lat) : '',
    lon: find?.lon != null ? String(find.lon) : '',
    depth: depthInputValue(find?.depthFt, prefs.depth),
    kind: find?.kind ?? 'hard-bottom',
    subKind: find?.subKind ?? FIND_SUB_KINDS['hard-bottom'][0],
    hardness: find?.hardness != null ? String(find.hardness) : '',
    vegetationDensity: find?.vegetationDensity ?? '',
    fishMarked: find?.fishMarked != null ? String(find.fishMarked) : '',
    frequencyKhz: find?.frequencyKhz != null ? String(find.frequencyKhz) : '',
    foundHow: find?.foundHow ?? '',
    waterTemp: temperatureInputValue(find?.waterTempF, prefs.temperature),
    notes: find?.notes ?? '',
    baitSeen: find?.baitSeen ?? false,
    photoId: find?.photoId ?? null,
  };
}

/** Read the form into the request, or say which field is wrong. Depth and water temperature go with their unit. */
export function validateFind(
  v: Values,
  lake: LakeView | undefined,
  prefs: UnitPreferences,
): { input?: FindInput; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  if (!v.lakeId) errors.lakeId = 'Choose the lake.';
  if (!v.name.trim()) errors.name = 'Give the find a name you will recognise on the water.';
  const lat = readCoordinate(v.lat, 'lat');
  const lon = readCoordinate(v.lon, 'lon');
  if (lat === null) errors.lat = 'Latitude in decimal degrees, -90 to 90.';
  if (lon === null) errors.lon = 'Longitude in decimal degrees, -180 to 180.';
  const depth = parseOptional(v.depth, (t) => parseDepth(t, prefs.depth));
  if (!depth.ok) errors.depth = depth.error;
  const temp = parseOptional(v.waterTemp, (t) => parseTemperature(t, prefs.temperature));
  if (!temp.ok) errors.waterTemp = temp.error;
  const fish = v.fishMarked.trim() ? readNumber(v.fishMarked) : null;
  if (v.fishMarked.trim() && (fish === null || !Number.isInteger(fish) || fish < 0))
    errors.fishMarked = 'A whole number of fish, 0 or more.';
  const khz = v.frequencyKhz.trim() ? readNumber(v.frequencyKhz) : null;
  if (v.frequencyKhz.trim() && (khz === null || khz < FREQUENCY_KHZ.min || khz > FREQUENCY_KHZ.max))
    errors.frequencyKhz = `Frequency (kHz): a number from ${FREQUENCY_KHZ.min} to ${FREQUENCY_KHZ.max}.`;
  let markedAt: string | null = null;
  if (v.markedDate || v.markedTime) {
    if (!v.markedDate || !isClockTime(v.markedTime))
      errors.markedAt = 'Give both the date and a 24-hour time (06:40), or neither.';
    else {
      const zone = lake?.timeZone ?? 'UTC';
      markedAt = localTimeOn(v.markedDate, v.markedTime.trim(), zone)?.toISOString() ?? null;
      if (!markedAt)
        errors.markedAt = `${v.markedTime.trim()} did not happen on ${v.markedDate} on the lake's clock (${zone}): the clocks went forward. Give a time outside that hour.`;
    }
  }
  if (Object.keys(errors).length || !depth.ok || !temp.ok) return { errors };
  return {
    errors,
    input: {
      lakeId: v.lakeId,
      eventId: v.eventId || null,
      practiceDate: v.practiceDate || null,
      name: v.name.trim(),
      markedAt,
      lat: lat!,
      lon: lon!,
      depth: depth.entry,
      kind: v.kind as FindKind,
      subKind: v.subKind,
      hardness: v.hardness ? (Number(v.hardness) as HardnessGrade) : null,
      vegetationDensity: (v.vegetationDensity || null) as VegetationDensity | null,
      baitSeen: v.baitSeen,
      fishMarked: fish,
      frequencyKhz: khz,
      foundHow: (v.foundHow || null) as FoundHow | null,
      waterTemp: temp.entry,
      notes: v.notes.trim(),
      photoId: v.photoId,
    },
  };
}

function SelectField({
  label,
  name,
  value,
  onChange,
  messages,
  caption,
  children,
}: {
  label: string;
  name: string;
  value: string;
  onChange: (value: string) => void;
  messages: string[];
  caption?: ReactNode;
  children: ReactNode;
}) {
  return (
    <FormControl>
      <FormControl.Label>{label}</FormControl.Label>
      <Select
        name={name}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        block
        validationStatus={messages.length ? 'error' : undefined}
      >
        {children}
      </Select>
      {caption ? <FormControl.Caption>{caption}</FormControl.Caption> : null}
      {messages.length ? <FormControl.Validation variant="error">{messages.join(' ')}</FormControl.Validation> : null}
    </FormControl>
  );
}

/** Record a practice find: where, how deep, what kind of place, what the sonar showed, and a photo. */
export function FindForm({
  userId,
  crewId,
  lakes,
  events,
  find,
  defaults = {},
  prefs,
  onSaved,
  onCancel,
}: {
  userId: string;
  crewId: string;
  lakes: LakeView[];
  events: EventView[];
  find?: FindWithSky;
  defaults?: { lakeId?: string; eventId?: string };
  prefs: UnitPreferences;
  onSaved: (find: FindWithSky) => void;
  onCancel?: () => void;
}) {
  const startLake = lakes.find((l) => l.id === (find?.lakeId ?? defaults.lakeId)) ?? lakes[0];
  const [v, setValues] = useState<Values>(() => initialValues(find, startLake, defaults, prefs));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [photoState, setPhotoState] = useState<{ busy: boolean; error: string | null; name: string | null }>({
    busy: false,
    error: null,
    name: null,
  });
  const save = useSaveFind(userId, crewId, find?.id);
  // The name of the last find kept on this phone for want of signal ("waiting to send"), until the next edit.
  const [waiting, setWaiting] = useState<string | null>(null);
  const photoInputId = useId();
  const lake = lakes.find((l) => l.id === v.lakeId);
  const lakeEvents = events.filter((e) => e.lakeId === v.lakeId);
  const event = lakeEvents.find((e) => e.id === v.eventId);
  const set = (key: keyof Values) => (value: string) => {
    setWaiting(null);
    setValues((s) => ({ ...s, [key]: value }));
  };
  const text = (key: keyof Values, name: string = key) => ({
    name,
    value: v[key] as string,
    onChange: (e: { target: { value: string } }) => set(key)(e.target.value),
    serverError: save.error,
    clientError: errors[name],
  });
  const messages = (name: string) => [...(errors[name] ? [errors[name]] : []), ...fieldMessages(save.error, name)];

  const onPhoto = async (file: File | undefined) => {
    if (!file) return;
    if (!file.type.startsWith('image/')) {
      setPhotoState({ busy: false, error: 'Choose an image file (a photo or a sonar screenshot).', name: null });
      return;
    }
    if (file.size > 8 * 1024 * 1024) {
      setPhotoState({ busy: false, error: 'The image is over 8 MB; send a smaller one.', name: null });
      return;
    }
    setPhotoState({ busy: true, error: null, name: file.name });
    try {
      const { id } = await uploadPhoto(crewId, file);
      setValues((s) => ({ ...s, photoId: id }));
      setPhotoState({ busy: false, error: null, name: file.name });
    } catch (error) {
      setPhotoState({
        busy: false,
        error: error instanceof Error ? error.message : 'The image could not be sent.',
        name: null,
      });
    }
  };

  const submit = () => {
    const { input, errors: found } = validateFind(v, lake, prefs);
    setErrors(found);
    if (!input) return;
    save.mutateAsync(find ? { ...input, version: find.version } : input).then(
      (result) => {
        if (result.kind === 'sent') return onSaved(result.answer);
        setWaiting(input.name);
        // A new find kept on the phone: the form clears for the next one, on the same lake, event and day.
        if (!find)
          setValues((s) => ({
            ...initialValues(undefined, lake, { lakeId: s.lakeId, eventId: s.eventId }, prefs),
            practiceDate: s.practiceDate,
          }));
      },
      () => undefined,
    );
  };

  return (
    <FormStack onSubmit={submit} label={find ? `Edit ${find.name}` : 'New find'}>
      <OnPlaneCaution />
      <FormError error={save.error} />
      <TextField
        label="Name"
        required
        autoComplete="off"
        placeholder="e.g. Shell bar off the north point"
        {...text('name')}
      />
      <div className={styles.grid}>
        <SelectField
          label="Lake"
          name="lakeId"
          value={v.lakeId}
          onChange={(id) => setValues((s) => ({ ...s, lakeId: id, eventId: '', practiceDate: '' }))}
          messages={messages('lakeId')}
        >
          {lakes.map((l) => (
            <Select.Option key={l.id} value={l.id}>
              {l.name}
            </Select.Option>
          ))}
        </SelectField>
        <SelectField
          label="Event"
          name="eventId"
          value={v.eventId}
          onChange={(id) => setValues((s) => ({ ...s, eventId: id, practiceDate: '' }))}
          messages={messages('eventId')}
        >
          <Select.Option value="">Not tied to an event</Select.Option>
          {lakeEvents.map((e) => (
            <Select.Option key={e.id} value={e.id}>
              {e.name}
            </Select.Option>
          ))}
        </SelectField>
        {event && event.practiceDates.length ? (
          <SelectField
            label="Practice day"
            name="practiceDate"
            value={v.practiceDate}
            onChange={set('practiceDate')}
            messages={messages('practiceDate')}
          >
            <Select.Option value="">—</Select.Option>
            {event.practiceDates.map((d) => (
              <Select.Option key={d} value={d}>
                {d}
              </Select.Option>
            ))}
          </SelectField>
        ) : null}
      </div>
      <div className={styles.grid}>
        <TextField label="Latitude" required inputMode="decimal" caption="Decimal degrees, WGS84" {...text('lat')} />
        <TextField label="Longitude" required inputMode="decimal" caption="West is negative" {...text('lon')} />
        <TextField label={`Depth (${UNIT_SIGNS[prefs.depth]})`} inputMode="decimal" {...text('depth')} />
      </div>
      <div className={styles.grid}>
        <TextField
          label="Date marked"
          type="date"
          {...text('markedDate', 'markedAt')}
          clientError={null}
          serverError={null}
        />
        <TextField
          label="Time marked (lake clock)"
          placeholder="06:40"
          inputMode="numeric"
          caption={lake ? lake.timeZone.replace(/_/g, ' ') : undefined}
          {...text('markedTime', 'markedAt')}
        />
      </div>
      <div className={styles.grid}>
        <SelectField
          label="Kind of place"
          name="kind"
          value={v.kind}
          onChange={(kind) => setValues((s) => ({ ...s, kind, subKind: FIND_SUB_KINDS[kind as FindKind][0] }))}
          messages={messages('kind')}
        >
          {FIND_KINDS.map((k) => (
            <Select.Option key={k} value={k}>
              {FIND_KIND_LABELS[k]}
            </Select.Option>
          ))}
        </SelectField>
        <SelectField
          label="Sub-kind"
          name="subKind"
          value={v.subKind}
          onChange={set('subKind')}
          messages={messages('subKind')}
        >
          {FIND_SUB_KINDS[v.kind as FindKind].map((s) => (
            <Select.Option key={s} value={s}>
              {s}
            </Select.Option>
          ))}
        </SelectField>
        <SelectField
          label="Hardness"
          name="hardness"
          value={v.hardness}
          onChange={set('hardness')}
          messages={messages('hardness')}
          caption="How strong and sharp the double echo looked: 1 faint and fuzzy, 5 strong and crisp."
        >
          <Select.Option value="">Not graded</Select.Option>
          {HARDNESS_GRADES.map((g) => (
            <Select.Option key={g} value={String(g)}>
              {HARDNESS_LABELS[g]}
            </Select.Option>
          ))}
        </SelectField>
        <SelectField
          label="Vegetation density"
          name="vegetationDensity"
          value={v.vegetationDensity}
          onChange={set('vegetationDensity')}
          messages={messages('vegetationDensity')}
        >
          <Select.Option value="">Not noted</Select.Option>
          {VEGETATION_DENSITIES.map((d) => (
            <Select.Option key={d} value={d}>
              {VEGETATION_LABELS[d]}
            </Select.Option>
          ))}
        </SelectField>
      </div>
      <div className={styles.grid}>
        <FormControl>
          <Checkbox checked={v.baitSeen} onChange={(e) => setValues((s) => ({ ...s, baitSeen: e.target.checked }))} />
          <FormControl.Label>Bait seen</FormControl.Label>
        </FormControl>
        <TextField label="Fish marked" inputMode="numeric" {...text('fishMarked')} />
        <TextField
          label="Frequency (kHz)"
          inputMode="decimal"
          caption="The sonar's frequency: a lower one gives a wider cone, a higher one a narrower cone"
          {...text('frequencyKhz')}
        />
        <SelectField
          label="How it was found"
          name="foundHow"
          value={v.foundHow}
          onChange={set('foundHow')}
          messages={messages('foundHow')}
        >
          <Select.Option value="">Not noted</Select.Option>
          {FOUND_HOW.map((h) => (
            <Select.Option key={h} value={h}>
              {FOUND_HOW_LABELS[h]}
            </Select.Option>
          ))}
        </SelectField>
        <TextField
          label={`Water temperature (${UNIT_SIGNS[prefs.temperature]})`}
          inputMode="decimal"
          {...text('waterTemp')}
        />
      </div>
      <FormControl>
        <FormControl.Label>Notes</FormControl.Label>
        <Textarea name="notes" value={v.notes} onChange={(e) => set('notes')(e.target.value)} block rows={3} />
      </FormControl>
      <div className={styles.photo}>
        <label htmlFor={photoInputId} className={styles.photoLabel}>
          Photo or sonar screenshot
        </label>
        <input
          id={photoInputId}
          type="file"
          accept="image/*"
          className={styles.file}
          aria-describedby={`${photoInputId}-caption`}
          onChange={(e) => onPhoto(e.target.files?.[0])}
        />
        <Text as="p" size="small" id={`${photoInputId}-caption`} className={styles.photoCaption}>
          An image up to 8 MB. Location tags inside the file are removed when it is stored; only your crew can open it.
        </Text>
        <div aria-live="polite">
          {photoState.busy ? <Text size="small">Sending {photoState.name}…</Text> : null}
          {!photoState.busy && v.photoId && photoState.name ? (
            <Text size="small">Attached: {photoState.name}</Text>
          ) : null}
          {photoState.error ? (
            <Text size="small" className={styles.photoError}>
              {photoState.error}
            </Text>
          ) : null}
        </div>
      </div>
      <FormActions>
        <Button type="submit" variant="primary" loading={save.isPending} disabled={photoState.busy}>
          {find ? 'Save find' : 'Add find'}
        </Button>
        {onCancel ? <Button onClick={onCancel}>Cancel</Button> : null}
        <div role="status" aria-live="polite">
          {waiting ? (
            <WaitingToSendNote>
              {find ? 'The changes are' : `${waiting} is`} saved on this phone and go to the server by themselves once
              there is signal.
            </WaitingToSendNote>
          ) : null}
        </div>
      </FormActions>
    </FormStack>
  );
}
