import type { UnitPreferences } from '@shoalbook/shared';
import { Button, Text } from '@primer/react';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { dayLabel, isClockTime } from '../../../lib/lake-time';
import type { CompetitionDayView } from '../../../lib/journal-types';
import { parseOptional, parseTemperature, temperatureInputValue, UNIT_SIGNS } from '../../../lib/units';
import { useUpdateCompetitionDay } from '../api/events-api';
import styles from './event-form.module.css';

/** Start and check-in times (lake clock), weather and water temperature of one competition day. */
export function CompetitionDayForm({
  crewId,
  day,
  prefs,
}: {
  crewId: string;
  day: CompetitionDayView;
  prefs: UnitPreferences;
}) {
  const [values, setValues] = useState({
    startTime: day.startTime ?? '',
    checkInTime: day.checkInTime ?? '',
    weatherNotes: day.weatherNotes ?? '',
    waterTemp: temperatureInputValue(day.waterTempF, prefs.temperature),
  });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);
  const update = useUpdateCompetitionDay(crewId);
  const set = (key: keyof typeof values) => (e: { target: { value: string } }) => {
    setSaved(false);
    setValues((v) => ({ ...v, [key]: e.target.value }));
  };
  const submit = () => {
    const found: Record<string, string> = {};
    if (values.startTime && !isClockTime(values.startTime)) found.startTime = 'A 24-hour time like 06:15.';
    if (values.checkInTime && !isClockTime(values.checkInTime)) found.checkInTime = 'A 24-hour time like 15:00.';
    const temp = parseOptional(values.waterTemp, (t) => parseTemperature(t, prefs.temperature));
    if (!temp.ok) found.waterTemp = temp.error;
    setErrors(found);
    if (Object.keys(found).length || !temp.ok) return;
    update.mutate(
      {
        dayId: day.id,
        version: day.version,
        startTime: values.startTime || null,
        checkInTime: values.checkInTime || null,
        weatherNotes: values.weatherNotes,
        waterTemp: temp.entry,
      },
      { onSuccess: () => setSaved(true) },
    );
  };
  const f = (key: keyof typeof values, name: string = key) => ({
    name,
    value: values[key],
    onChange: set(key),
    serverError: update.error,
    clientError: errors[name],
  });
  return (
    <FormStack onSubmit={submit} label={`Competition day ${dayLabel(day.date)}`}>
      <FormError error={update.error} />
      <div className={styles.pair}>
        <TextField label="Start (lake time)" placeholder="06:15" inputMode="numeric" {...f('startTime')} />
        <TextField label="Check-in (lake time)" placeholder="15:00" inputMode="numeric" {...f('checkInTime')} />
        <TextField
          label={`Water temperature (${UNIT_SIGNS[prefs.temperature]})`}
          inputMode="decimal"
          {...f('waterTemp', 'waterTemp')}
        />
      </div>
      <TextField label="Weather" placeholder="Wind, sky, front, pressure" {...f('weatherNotes')} />
      <FormActions>
        <Button type="submit" loading={update.isPending}>
          Save day details
        </Button>
        {saved ? (
          <Text role="status" size="small">
            Saved.
          </Text>
        ) : null}
      </FormActions>
    </FormStack>
  );
}
