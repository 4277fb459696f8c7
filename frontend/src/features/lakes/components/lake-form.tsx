import type { LakeView } from '@shoalbook/shared';
import { Button, FormControl, Textarea } from '@primer/react';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField, fieldMessages } from '../../../components/form/text-field';
import { browserTimeZone } from '../../../lib/lake-time';
import { readCoordinate, readNumber } from '../../../lib/units';
import { useSaveLake, type LakeInput } from '../api/lakes-api';
import { TimeZoneSelect } from './time-zone-select';

type Errors = Partial<Record<keyof LakeInput, string>>;

/** Check the typed lake before sending; the server checks again and its messages land beside the same fields. */
export function validateLake(values: Record<keyof LakeInput, string>): { input?: LakeInput; errors: Errors } {
  const errors: Errors = {};
  if (!values.name.trim()) errors.name = 'Give the lake a name.';
  const lat = readCoordinate(values.lat, 'lat');
  const lon = readCoordinate(values.lon, 'lon');
  if (lat === null) errors.lat = 'Latitude is a decimal number from -90 to 90, e.g. 34.512.';
  if (lon === null) errors.lon = 'Longitude is a decimal number from -180 to 180, e.g. -86.204.';
  const area = values.areaAcres.trim() ? readNumber(values.areaAcres) : null;
  if (values.areaAcres.trim() && (area === null || area <= 0))
    errors.areaAcres = 'Area is a positive number of acres, or leave it empty.';
  if (Object.keys(errors).length) return { errors };
  return {
    errors,
    input: {
      name: values.name.trim(),
      region: values.region.trim(),
      timeZone: values.timeZone,
      lat: lat!,
      lon: lon!,
      areaAcres: area,
      notes: values.notes.trim(),
    },
  };
}

/** Create or edit a lake: name, region, its time zone, a reference point and optional area and notes. */
export function LakeForm({
  crewId,
  lake,
  onSaved,
  onCancel,
}: {
  crewId: string;
  lake?: LakeView;
  onSaved: (lake: LakeView) => void;
  onCancel?: () => void;
}) {
  const [values, setValues] = useState<Record<keyof LakeInput, string>>({
    name: lake?.name ?? '',
    region: lake?.region ?? '',
    timeZone: lake?.timeZone ?? browserTimeZone(),
    lat: lake ? String(lake.lat) : '',
    lon: lake ? String(lake.lon) : '',
    areaAcres: lake?.areaAcres != null ? String(lake.areaAcres) : '',
    notes: lake?.notes ?? '',
  });
  const [errors, setErrors] = useState<Errors>({});
  const save = useSaveLake(crewId, lake?.id);
  const set = (key: keyof LakeInput) => (e: { target: { value: string } }) =>
    setValues((v) => ({ ...v, [key]: e.target.value }));

  const submit = () => {
    const { input, errors: found } = validateLake(values);
    setErrors(found);
    if (input) save.mutate(lake ? { ...input, version: lake.version } : input, { onSuccess: onSaved });
  };

  const common = (key: keyof LakeInput) => ({
    name: key,
    value: values[key],
    onChange: set(key),
    serverError: save.error,
    clientError: errors[key],
  });
  return (
    <FormStack onSubmit={submit} label={lake ? `Edit ${lake.name}` : 'New lake'}>
      <FormError error={save.error} />
      <TextField label="Name" required autoComplete="off" {...common('name')} />
      <TextField label="Region" caption="State, county or area, as your crew says it." {...common('region')} />
      <TimeZoneSelect
        value={values.timeZone}
        onChange={(timeZone) => setValues((v) => ({ ...v, timeZone }))}
        messages={fieldMessages(save.error, 'timeZone')}
      />
      <TextField
        label="Latitude"
        required
        inputMode="decimal"
        caption="Decimal degrees (WGS84), a point on the lake."
        {...common('lat')}
      />
      <TextField
        label="Longitude"
        required
        inputMode="decimal"
        caption="Decimal degrees; west of Greenwich is negative."
        {...common('lon')}
      />
      <TextField label="Area (acres)" inputMode="decimal" {...common('areaAcres')} />
      <FormControl>
        <FormControl.Label>Notes</FormControl.Label>
        <Textarea name="notes" value={values.notes} onChange={set('notes')} block rows={3} />
        {fieldMessages(save.error, 'notes').length ? (
          <FormControl.Validation variant="error">
            {fieldMessages(save.error, 'notes').join(' ')}
          </FormControl.Validation>
        ) : null}
      </FormControl>
      <FormActions>
        <Button type="submit" variant="primary" loading={save.isPending}>
          {lake ? 'Save lake' : 'Add lake'}
        </Button>
        {onCancel ? <Button onClick={onCancel}>Cancel</Button> : null}
      </FormActions>
    </FormStack>
  );
}
