import { useLayoutEffect, useRef, useState, type ReactNode } from 'react';
import styles from './charts.module.css';

/**
 * A chart's box: a fixed height (nivo draws nothing in a 0-high box) and the measured width handed to the
 * chart. Measuring ourselves (getBoundingClientRect, then a ResizeObserver) instead of nivo's Responsive*
 * wrappers lets tests size the chart by mocking getBoundingClientRect alone.
 */
export function ChartFrame({
  height,
  label,
  children,
}: {
  /** Height in px. */
  height: number;
  /** What the chart shows, for screen readers (the table beside it carries the numbers). */
  label: string;
  children: (size: { width: number; height: number }) => ReactNode;
}) {
  const ref = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(0);

  useLayoutEffect(() => {
    const element = ref.current;
    if (!element) return;
    const measure = () => setWidth(Math.floor(element.getBoundingClientRect().width));
    measure();
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(measure);
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  return (
    <figure className={styles.frame} style={{ height }} aria-label={label} ref={ref}>
      {width > 0 ? children({ width, height }) : null}
    </figure>
  );
}
