import { FormControl, Radio, RadioGroup } from '@primer/react';
import { COLOR_MODE_CHOICES, setColorMode, useColorMode, type ColorModeChoice } from '../../../lib/color-mode';

const LABELS: Record<ColorModeChoice, string> = {
  auto: 'As this device is set',
  light: 'Light (best in sunlight)',
  dark: 'Dark (easier at night)',
};

/** Light or dark screens on this device; applied at once, kept in this browser. */
export function AppearanceForm() {
  const mode = useColorMode();
  return (
    <RadioGroup name="colorMode" onChange={(value) => value && setColorMode(value as ColorModeChoice)}>
      <RadioGroup.Label>Screens</RadioGroup.Label>
      {COLOR_MODE_CHOICES.map((choice) => (
        <FormControl key={choice}>
          <Radio value={choice} checked={mode === choice} onChange={() => setColorMode(choice)} />
          <FormControl.Label>{LABELS[choice]}</FormControl.Label>
        </FormControl>
      ))}
    </RadioGroup>
  );
}
