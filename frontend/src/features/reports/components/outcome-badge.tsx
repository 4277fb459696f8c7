import { CheckCircleFillIcon, CircleIcon, DashIcon, XCircleIcon } from '@primer/octicons-react';
import type { FindOutcome } from '../api/report-types';
import { OUTCOME_LABELS } from './report-labels';
import styles from './reports.module.css';

const ICONS = {
  weighed: CheckCircleFillIcon,
  caught: CircleIcon,
  'fished-blank': XCircleIcon,
  'not-fished': DashIcon,
} as const;

const COLOURS: Record<FindOutcome, string> = {
  weighed: 'var(--fgColor-success)',
  caught: 'var(--fgColor-accent)',
  'fished-blank': 'var(--fgColor-muted)',
  'not-fished': 'var(--fgColor-muted)',
};

/** A find's outcome as an icon of its own shape plus words, never colour alone. */
export function OutcomeBadge({ outcome }: { outcome: FindOutcome }) {
  const Icon = ICONS[outcome];
  return (
    <span className={styles.outcome}>
      <Icon aria-hidden fill={COLOURS[outcome]} />
      {OUTCOME_LABELS[outcome]}
    </span>
  );
}
