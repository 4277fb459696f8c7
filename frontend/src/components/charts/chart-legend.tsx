import type { ReactNode } from 'react';
import styles from './charts.module.css';

/** A legend in HTML (readable, translatable and printable), one entry per mark with its drawn sample. */
export function ChartLegend({
  items,
  label,
}: {
  items: Array<{ key: string; sample: ReactNode; text: ReactNode }>;
  label: string;
}) {
  return (
    <ul className={styles.legend} aria-label={label}>
      {items.map((item) => (
        <li key={item.key} className={styles.legendItem}>
          <span className={styles.swatch}>{item.sample}</span>
          <span>{item.text}</span>
        </li>
      ))}
    </ul>
  );
}

/** Legend sample of an interval whisker. */
export function WhiskerSample() {
  return (
    <svg width={26} height={14} aria-hidden="true" focusable="false">
      <line x1={2} y1={7} x2={24} y2={7} stroke="#1f2328" strokeWidth={2} />
      <line x1={2} y1={2} x2={2} y2={12} stroke="#1f2328" strokeWidth={2} />
      <line x1={24} y1={2} x2={24} y2={12} stroke="#1f2328" strokeWidth={2} />
    </svg>
  );
}

/** Legend sample of the diamond marker. */
export function MarkerSample() {
  return (
    <svg width={14} height={14} aria-hidden="true" focusable="false">
      <path d="M 7 1 L 13 7 L 7 13 L 1 7 Z" fill="#f2b84b" stroke="#1f2328" strokeWidth={1.5} />
    </svg>
  );
}
