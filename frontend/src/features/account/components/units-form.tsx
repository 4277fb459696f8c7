import {
  DEPTH_UNITS,
  LENGTH_UNITS,
  TEMPERATURE_UNITS,
  WEIGHT_UNITS,
  type MeResponse,
  type UnitPreferences,
} from '@shoalbook/shared';
import { Button, FormControl, Radio, RadioGroup, Text } from '@primer/react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormError } from '../../../components/form/form-error';
import { FormActions, FormStack } from '../../../components/form/form-stack';
import { fieldMessages } from '../../../components/form/text-field';
import { meQuery } from '../../../lib/auth';
import { updateAccount } from '../api/account-api';
import styles from './account-forms.module.css';

type UnitKind = keyof UnitPreferences;

/** Choices per kind, in the words shown to people, with the example that makes each unambiguous. */
const UNIT_CHOICES: {
  [K in UnitKind]: { legend: string; options: { value: UnitPreferences[K]; label: string; example: string }[] };
} = {
  weight: {
    legend: 'Weight',
    options: [
      { value: WEIGHT_UNITS[0], label: 'Pounds, decimal', example: '4.75 lb' },
      { value: WEIGHT_UNITS[1], label: 'Pounds and ounces', example: '4 lb 12 oz' },
      { value: WEIGHT_UNITS[2], label: 'Kilograms', example: '2.15 kg' },
    ],
  },
  length: {
    legend: 'Fish length',
    options: [
      { value: LENGTH_UNITS[0], label: 'Inches', example: '15.25 in' },
      { value: LENGTH_UNITS[1], label: 'Millimetres', example: '387 mm' },
    ],
  },
  depth: {
    legend: 'Water depth',
    options: [
      { value: DEPTH_UNITS[0], label: 'Feet', example: '18 ft' },
      { value: DEPTH_UNITS[1], label: 'Metres', example: '5.5 m' },
    ],
  },
  temperature: {
    legend: 'Water temperature',
    options: [
      { value: TEMPERATURE_UNITS[0], label: 'Fahrenheit', example: '68 °F' },
      { value: TEMPERATURE_UNITS[1], label: 'Celsius', example: '20 °C' },
    ],
  },
};

const KINDS: UnitKind[] = ['weight', 'length', 'depth', 'temperature'];

/** How weights, lengths, depths and temperatures are shown to this person; stored values are never rounded. */
export function UnitsForm({ units }: { units: UnitPreferences }) {
  const queryClient = useQueryClient();
  const [saved, setSaved] = useState<UnitPreferences>(units);
  const [choice, setChoice] = useState<UnitPreferences>(units);
  const mutation = useMutation({
    mutationFn: (next: UnitPreferences) => updateAccount({ units: next }),
    onSuccess: (me: MeResponse) => {
      queryClient.setQueryData(meQuery.queryKey, me);
      setSaved(me.user.units);
      setChoice(me.user.units);
    },
  });
  const unchanged = KINDS.every((k) => choice[k] === saved[k]);

  return (
    <FormStack label="Units" onSubmit={() => mutation.mutate(choice)}>
      <FormError error={mutation.error} title="Units were not saved" />
      <div className={styles.unitGrid}>
        {KINDS.map((kind) => {
          const messages = [
            ...fieldMessages(mutation.error, `units.${kind}`),
            ...fieldMessages(mutation.error, 'units'),
          ];
          return (
            <RadioGroup
              key={kind}
              name={kind}
              onChange={(value) => value && setChoice((c) => ({ ...c, [kind]: value }))}
            >
              <RadioGroup.Label className={styles.legend}>{UNIT_CHOICES[kind].legend}</RadioGroup.Label>
              {UNIT_CHOICES[kind].options.map((option) => (
                <FormControl key={option.value}>
                  <Radio value={option.value} checked={choice[kind] === option.value} />
                  <FormControl.Label>
                    {option.label}{' '}
                    <Text as="span" className={styles.example}>
                      ({option.example})
                    </Text>
                  </FormControl.Label>
                </FormControl>
              ))}
              {messages.length ? (
                <RadioGroup.Validation variant="error">{messages.join(' ')}</RadioGroup.Validation>
              ) : null}
            </RadioGroup>
          );
        })}
      </div>
      <FormActions>
        <Button type="submit" variant="primary" loading={mutation.isPending} disabled={unchanged && !mutation.isError}>
          Save units
        </Button>
        {mutation.isSuccess && unchanged ? <Text role="status">Units saved.</Text> : null}
      </FormActions>
    </FormStack>
  );
}
