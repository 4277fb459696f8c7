import {
  FATES,
  SPECIES,
  SPECIES_LABELS,
  type Fate,
  type FindView,
  type Species,
  type UnitPreferences,
} from '@shoalbook/shared';
import { Button, FormControl, Label, Select, Text, Textarea, TextInput } from '@primer/react';
import { useId, useState, type ReactNode } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { PhotoField } from '../../../components/journal-forms/photo-field';
import { isStaleVersion, StaleVersionBanner } from '../../../components/journal-forms/stale-version-banner';
import { WaitingToSendNote } from '../../../components/send-queue/entry-state';
import { ApiRequestError } from '../../../lib/api-client';
import { clockTime, dayLabel, isClockTime } from '../../../lib/lake-time';
import type { CatchWithSky } from '../../../lib/journal-types';
import {
  parseDepth,
  parseLength,
  parseOptional,
  parseTemperature,
  parseWeight,
  UNIT_SIGNS,
  weightHint,
} from '../../../lib/units';
import { useUpdateCatch, type CatchChanges } from '../api/catches-api';
import { FATE_LABELS } from './catch-labels';
import { catchInputValues, findOptionLabel, matchFind, typedAs } from './catch-values';
import styles from './catch-edit-form.module.css';

interface Values {
  caughtAt: string;
  species: Species;
  weight: string;
  length: string;
  find: string;
  fate: Fate;
  lure: string;
  technique: string;
  depth: string;
  waterTemp: string;
  notes: string;
}

/** Request fields whose server messages belong beside each input (the API accepts canonical or entered forms). */
const SERVER_FIELDS: Record<keyof Values | 'photo', string[]> = {
  caughtAt: ['caughtAt'],
  species: ['species'],
  weight: ['weight', 'weight.value', 'weight.ounces', 'weightLb'],
  length: ['length', 'length.value', 'lengthIn'],
  find: ['findId'],
  fate: ['fate'],
  lure: ['lure'],
  technique: ['technique'],
  depth: ['depth', 'depth.value', 'depthFt'],
  waterTemp: ['waterTemp', 'waterTemp.value', 'waterTempF'],
  notes: ['notes'],
  photo: ['photoId'],
};

function startValues(c: CatchWithSky, finds: FindView[], prefs: UnitPreferences, timeZone: string): Values {
  const find = finds.find((f) => f.id === c.findId);
  return {
    caughtAt: clockTime(c.caughtAt, timeZone),
    species: c.species,
    find: find ? findOptionLabel(find, prefs) : c.findId ? (c.findName ?? '') : '',
    fate: c.fate,
    lure: c.lure,
    technique: c.technique,
    notes: c.notes ?? '',
    ...catchInputValues(c, prefs),
  };
}

/**
 * Only what the angler changed goes to the server: an untouched weight keeps exactly what was typed
 * first, and an untouched find keeps its attribution from coordinates.
 */
export function catchChanges(
  start: Values,
  now: Values,
  ctx: { catchView: CatchWithSky; finds: FindView[]; prefs: UnitPreferences; photoId: string | null },
): { changes?: CatchChanges; errors: Record<string, string> } {
  const { catchView, finds, prefs } = ctx;
  const errors: Record<string, string> = {};
  const changes: CatchChanges = { version: catchView.version ?? 1 };
  const changed = (key: keyof Values) => now[key].trim() !== start[key].trim();
  if (changed('caughtAt')) {
    if (!isClockTime(now.caughtAt)) errors.caughtAt = 'A 24-hour time on the lake clock, like 07:42.';
    else changes.caughtAt = now.caughtAt.trim();
  }
  if (changed('weight')) {
    const weight = parseWeight(now.weight, prefs.weight);
    if (weight.ok) changes.weight = weight.entry;
    else errors.weight = weight.error;
  }
  if (changed('length')) {
    const length = parseOptional(now.length, (t) => parseLength(t, prefs.length));
    if (length.ok) changes.length = length.entry;
    else errors.length = length.error;
  }
  if (changed('depth')) {
    const depth = parseOptional(now.depth, (t) => parseDepth(t, prefs.depth));
    if (depth.ok) changes.depth = depth.entry;
    else errors.depth = depth.error;
  }
  if (changed('waterTemp')) {
    const temp = parseOptional(now.waterTemp, (t) => parseTemperature(t, prefs.temperature));
    if (temp.ok) changes.waterTemp = temp.entry;
    else errors.waterTemp = temp.error;
  }
  if (changed('find')) {
    if (!now.find.trim()) changes.findId = null;
    else {
      const match = matchFind(now.find, finds, prefs);
      if (match) changes.findId = match.id;
      else errors.find = 'No find by that name on this lake: pick one from the list, or empty the field for no find.';
    }
  }
  if (now.species !== start.species) changes.species = now.species;
  if (now.fate !== start.fate) changes.fate = now.fate;
  if (changed('lure')) changes.lure = now.lure.trim();
  if (changed('technique')) changes.technique = now.technique.trim();
  if (changed('notes')) changes.notes = now.notes.trim();
  if (ctx.photoId !== catchView.photoId) changes.photoId = ctx.photoId;
  return Object.keys(errors).length ? { errors } : { changes, errors };
}

/**
 * Correct a logged catch: every field of the entry form, plus notes and a photo. The save carries the
 * version the form was loaded with; if someone saved first (409 stale_version) the form says so and offers
 * to reload their version.
 */
export function CatchEditForm({
  userId,
  crewId,
  catchView,
  finds,
  prefs,
  timeZone,
  onSaved,
  onReload,
  onEdit,
}: {
  /** Whose send queue keeps the changes until the server has them. */
  userId: string;
  crewId: string;
  catchView: CatchWithSky;
  finds: FindView[];
  prefs: UnitPreferences;
  timeZone: string;
  onSaved: (saved: CatchWithSky) => void;
  /** Fetch the latest version of the catch (the form is remounted with it). */
  onReload: () => void;
  /** Called on every change, so the page can drop an earlier "saved" note that no longer describes the form. */
  onEdit?: () => void;
}) {
  const [start] = useState(() => startValues(catchView, finds, prefs, timeZone));
  const [values, setValues] = useState<Values>(start);
  const [photo, setPhoto] = useState<{ photoId: string | null; busy: boolean }>({
    photoId: catchView.photoId,
    busy: false,
  });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [unchanged, setUnchanged] = useState(false);
  const [waiting, setWaiting] = useState(false);
  const update = useUpdateCatch(userId, crewId, catchView.id, `Changes to the catch at ${start.caughtAt}`);
  const listId = useId();
  const stale = isStaleVersion(update.error);

  const set = (key: keyof Values) => (e: { target: { value: string } }) => {
    setUnchanged(false);
    setWaiting(false);
    onEdit?.();
    setValues((v) => ({ ...v, [key]: e.target.value }));
  };
  const server = (key: keyof typeof SERVER_FIELDS) =>
    update.error instanceof ApiRequestError
      ? SERVER_FIELDS[key].flatMap((name) => (update.error as ApiRequestError).messagesFor(name))
      : [];
  const text = (
    key: keyof Values,
    label: string,
    extra: { caption?: ReactNode; inputMode?: 'decimal' | 'numeric'; placeholder?: string } = {},
  ) => {
    const msgs = [...(errors[key] ? [errors[key]] : []), ...server(key)];
    return (
      <TextField
        label={label}
        name={key}
        value={values[key]}
        onChange={set(key)}
        autoComplete="off"
        clientError={msgs.length ? msgs.join(' ') : null}
        {...extra}
      />
    );
  };
  const select = <T extends string>(
    key: 'species' | 'fate',
    label: string,
    options: readonly T[],
    labels: Record<T, string>,
  ) => {
    const msgs = server(key);
    return (
      <FormControl>
        <FormControl.Label>{label}</FormControl.Label>
        <Select
          name={key}
          block
          value={values[key]}
          onChange={set(key)}
          validationStatus={msgs.length ? 'error' : undefined}
        >
          {options.map((o) => (
            <Select.Option key={o} value={o}>
              {labels[o]}
            </Select.Option>
          ))}
        </Select>
        {msgs.length ? <FormControl.Validation variant="error">{msgs.join(' ')}</FormControl.Validation> : null}
      </FormControl>
    );
  };

  const submit = () => {
    if (update.isPending || photo.busy) return;
    const { changes, errors: found } = catchChanges(start, values, { catchView, finds, prefs, photoId: photo.photoId });
    setErrors(found);
    if (!changes) return;
    if (Object.keys(changes).length === 1) {
      setUnchanged(true);
      return;
    }
    // mutateAsync, not mutate's callbacks: saving bumps the version, which remounts this form before they would run.
    update.mutateAsync(changes).then(
      (result) => (result.kind === 'sent' ? onSaved(result.answer) : setWaiting(true)),
      () => undefined,
    );
  };

  const weightEntered = typedAs(catchView.entered?.weight, prefs.weight);
  const attribution =
    catchView.findId && catchView.attributionDistanceM !== null
      ? `Matched from the catch's coordinates: ${Math.round(catchView.attributionDistanceM)} m from this find. Pick another to change it.`
      : 'The practice find it came from; empty for none.';
  const findMessages = [...(errors.find ? [errors.find] : []), ...server('find')];

  return (
    <FormStack onSubmit={submit} label={`Edit the catch at ${start.caughtAt}`}>
      <StaleVersionBanner error={update.error} what="catch" onReload={onReload} />
      {stale ? null : <FormError error={update.error} title="The changes were not saved" />}
      <div className={styles.grid}>
        {text('caughtAt', 'Time (lake clock)', {
          inputMode: 'numeric',
          placeholder: '07:42',
          caption: `${dayLabel(catchView.competitionDate)}, ${timeZone.replace(/_/g, ' ')}`,
        })}
        {select('species', 'Species', SPECIES, SPECIES_LABELS)}
        {text('weight', `Weight (${UNIT_SIGNS[prefs.weight]})`, {
          inputMode: 'decimal',
          caption: weightEntered ?? weightHint(prefs.weight),
        })}
        {text('length', `Length (${UNIT_SIGNS[prefs.length]})`, {
          inputMode: 'decimal',
          caption: typedAs(catchView.entered?.length, prefs.length) ?? 'Optional',
        })}
      </div>
      {catchView.weightFlagged ? (
        <p className={styles.flag}>
          <Label variant="attention">Check this weight</Label>{' '}
          <Text size="small">
            It does not fit the length for this species. If both are right, leave them as they are.
          </Text>
        </p>
      ) : null}
      <div className={styles.grid}>
        <FormControl>
          <FormControl.Label>Find (type to filter)</FormControl.Label>
          <TextInput
            name="find"
            list={listId}
            block
            size="large"
            autoComplete="off"
            value={values.find}
            onChange={set('find')}
            validationStatus={findMessages.length ? 'error' : undefined}
          />
          <FormControl.Caption>{attribution}</FormControl.Caption>
          {findMessages.length ? (
            <FormControl.Validation variant="error">{findMessages.join(' ')}</FormControl.Validation>
          ) : null}
        </FormControl>
        {select('fate', 'Fate', FATES, FATE_LABELS)}
      </div>
      <div className={styles.grid}>
        {text('lure', 'Lure')}
        {text('technique', 'Technique')}
        {text('depth', `Depth (${UNIT_SIGNS[prefs.depth]})`, {
          inputMode: 'decimal',
          caption: typedAs(catchView.entered?.depth, prefs.depth) ?? undefined,
        })}
        {text('waterTemp', `Water (${UNIT_SIGNS[prefs.temperature]})`, {
          inputMode: 'decimal',
          caption: typedAs(catchView.entered?.waterTemp, prefs.temperature) ?? undefined,
        })}
      </div>
      <FormControl>
        <FormControl.Label>Notes</FormControl.Label>
        <Textarea name="notes" value={values.notes} onChange={set('notes')} block rows={3} />
        {server('notes').length ? (
          <FormControl.Validation variant="error">{server('notes').join(' ')}</FormControl.Validation>
        ) : null}
      </FormControl>
      <PhotoField
        crewId={crewId}
        label="Photo"
        photoId={photo.photoId}
        onChange={(p) => {
          setUnchanged(false);
          onEdit?.();
          setPhoto(p);
        }}
        describe="Photo of this catch"
      />
      {server('photo').length ? <Text className={styles.error}>{server('photo').join(' ')}</Text> : null}
      <datalist id={listId}>
        {finds.map((f) => (
          <option key={f.id} value={findOptionLabel(f, prefs)} />
        ))}
      </datalist>
      <FormActions>
        <Button type="submit" variant="primary" loading={update.isPending} disabled={photo.busy || stale}>
          Save changes
        </Button>
        <div role="status" aria-live="polite">
          {unchanged ? <Text size="small">Nothing has changed yet, so there is nothing to save.</Text> : null}
          {waiting ? (
            <WaitingToSendNote>
              Saved on this phone. The changes go to the server by themselves once there is signal.
            </WaitingToSendNote>
          ) : null}
        </div>
      </FormActions>
    </FormStack>
  );
}
