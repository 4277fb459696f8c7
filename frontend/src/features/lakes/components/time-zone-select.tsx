import { FormControl, Select } from '@primer/react';
import { useMemo } from 'react';
import { timeZones } from '../../../lib/lake-time';

/**
 * IANA time-zone picker grouped by area ("America", "Europe" …). A native select keeps type-to-jump:
 * typing "America/Ch" lands on America/Chicago.
 */
export function TimeZoneSelect({
  value,
  onChange,
  messages,
}: {
  value: string;
  onChange: (zone: string) => void;
  messages: string[];
}) {
  const groups = useMemo(() => {
    const byArea = new Map<string, string[]>();
    const zones = timeZones();
    if (value && !zones.includes(value)) zones.unshift(value);
    for (const zone of zones) {
      const area = zone.includes('/') ? zone.split('/')[0] : 'Other';
      byArea.set(area, [...(byArea.get(area) ?? []), zone]);
    }
    return [...byArea.entries()];
  }, [value]);
  return (
    <FormControl required>
      <FormControl.Label>Time zone</FormControl.Label>
      <Select
        name="timeZone"
        value={value}
        onChange={(e) => onChange(e.target.value)}
        block
        validationStatus={messages.length ? 'error' : undefined}
      >
        {groups.map(([area, zones]) => (
          <Select.OptGroup key={area} label={area}>
            {zones.map((zone) => (
              <Select.Option key={zone} value={zone}>
                {zone.replace(/_/g, ' ')}
              </Select.Option>
            ))}
          </Select.OptGroup>
        ))}
      </Select>
      <FormControl.Caption>The lake&rsquo;s own clock: times of finds and catches are shown in it.</FormControl.Caption>
      {messages.length ? <FormControl.Validation variant="error">{messages.join(' ')}</FormControl.Validation> : null}
    </FormControl>
  );
}
