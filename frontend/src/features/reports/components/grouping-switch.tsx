import { SegmentedControl } from '@primer/react';
import { HIT_RATE_GROUPINGS, type HitRateGrouping } from '../api/report-types';
import { GROUPING_LABELS } from './report-labels';

/**
 * Chooses how finds are grouped; the choice lives in the address (?by=…). Seven labelled segments do not
 * fit a phone, so on a narrow viewport (Primer's < 768 px) the control becomes a menu of the same choices.
 */
export function GroupingSwitch({
  value,
  onChange,
  options = HIT_RATE_GROUPINGS,
}: {
  value: HitRateGrouping;
  onChange: (by: HitRateGrouping) => void;
  options?: readonly HitRateGrouping[];
}) {
  return (
    <SegmentedControl
      aria-label="Group finds by"
      variant={{ narrow: 'dropdown', regular: 'default' }}
      onChange={(index) => onChange(options[index])}
    >
      {options.map((by) => (
        <SegmentedControl.Button key={by} selected={by === value}>
          {GROUPING_LABELS[by]}
        </SegmentedControl.Button>
      ))}
    </SegmentedControl>
  );
}

/** The grouping of the address, or `fallback` when missing or unknown. */
export function readGrouping(
  params: URLSearchParams,
  options: readonly HitRateGrouping[] = HIT_RATE_GROUPINGS,
  fallback: HitRateGrouping = 'kind',
): HitRateGrouping {
  const by = params.get('by');
  return by && (options as readonly string[]).includes(by) ? (by as HitRateGrouping) : fallback;
}
