import type { UnitPreferences } from '@shoalbook/shared';
import { Button, Text } from '@primer/react';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { TextField } from '../../../components/form/text-field';
import { WaitingToSendNote } from '../../../components/send-queue/entry-state';
import type { OfficialWeighIn } from '../../../lib/journal-types';
import { dayLabel } from '../../../lib/lake-time';
import { entryToLb, parseOptional, parseWeight, readNumber, weightHint, weightInputValue } from '../../../lib/units';
import { useRecordWeighIn } from '../api/weigh-ins-api';
import styles from './weigh-ins.module.css';

const WEIGHT_LABELS = { grossLb: 'Gross on the scale', penaltyLb: 'Penalties', officialLb: 'Official weight' };

/** The scale's own figures for a day; once saved they count instead of Shoalbook's computed bag. */
export function OfficialWeighInForm({
  userId,
  crewId,
  dayId,
  date,
  official,
  prefs,
}: {
  userId: string;
  crewId: string;
  dayId: string;
  /** The competition day's date, for how the send queue names the entry. */
  date: string;
  official: OfficialWeighIn | null;
  prefs: UnitPreferences;
}) {
  const [v, setV] = useState({
    grossLb: weightInputValue(official?.grossLb, prefs.weight),
    penaltyLb: weightInputValue(official?.penaltyLb, prefs.weight),
    officialLb: weightInputValue(official?.officialLb, prefs.weight),
    dayPlace: official?.dayPlace != null ? String(official.dayPlace) : '',
    lateMinutes: official?.lateMinutes != null ? String(official.lateMinutes) : '',
  });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState<'sent' | 'waiting' | null>(null);
  const record = useRecordWeighIn(userId, crewId);
  const f = (key: keyof typeof v) => ({
    name: key,
    value: v[key],
    onChange: (e: { target: { value: string } }) => {
      setSaved(null);
      setV((s) => ({ ...s, [key]: e.target.value }));
    },
    serverError: record.error,
    clientError: errors[key],
  });
  const submit = () => {
    const found: Record<string, string> = {};
    const weight = (key: 'grossLb' | 'penaltyLb' | 'officialLb') => {
      const parsed = parseOptional(v[key], (t) => parseWeight(t, prefs.weight, WEIGHT_LABELS[key]));
      if (!parsed.ok) {
        found[key] = parsed.error;
        return null;
      }
      return parsed.entry ? entryToLb(parsed.entry) : null;
    };
    const whole = (key: 'dayPlace' | 'lateMinutes', min: number) => {
      if (!v[key].trim()) return null;
      const n = readNumber(v[key]);
      if (n === null || !Number.isInteger(n) || n < min) found[key] = `A whole number from ${min}.`;
      return n;
    };
    const body = {
      grossLb: weight('grossLb'),
      penaltyLb: weight('penaltyLb'),
      officialLb: weight('officialLb'),
      dayPlace: whole('dayPlace', 1),
      lateMinutes: whole('lateMinutes', 0),
      // The figures this correction is based on; the server refuses it if someone saved in between.
      ...(official?.version !== undefined ? { version: official.version } : {}),
    };
    setErrors(found);
    if (Object.keys(found).length) return;
    record.mutate(
      { dayId, label: `Official figures for ${dayLabel(date)}`, ...body },
      { onSuccess: (result) => setSaved(result.kind) },
    );
  };
  return (
    <FormStack onSubmit={submit} label="Official weigh-in">
      <FormError error={record.error} />
      <div className={styles.formGrid}>
        <TextField label={WEIGHT_LABELS.grossLb} caption={weightHint(prefs.weight)} {...f('grossLb')} />
        <TextField label={WEIGHT_LABELS.penaltyLb} {...f('penaltyLb')} />
        <TextField label={WEIGHT_LABELS.officialLb} {...f('officialLb')} />
        <TextField label="Minutes late" inputMode="numeric" {...f('lateMinutes')} />
        <TextField label="Day place" inputMode="numeric" {...f('dayPlace')} />
      </div>
      <FormActions>
        <Button type="submit" loading={record.isPending}>
          Save official figures
        </Button>
        <div role="status" aria-live="polite">
          {saved === 'sent' ? <Text size="small">Saved; the official figures now count.</Text> : null}
          {saved === 'waiting' ? (
            <WaitingToSendNote>
              Saved on this phone. The figures go to the server by themselves once there is signal, and count from then.
            </WaitingToSendNote>
          ) : null}
        </div>
      </FormActions>
    </FormStack>
  );
}
