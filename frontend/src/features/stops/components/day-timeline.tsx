import { Text } from '@primer/react';
import { clockTime } from '@shoalbook/shared';
import type { TimelineModel } from './day-timeline-model';
import styles from './stops.module.css';

const pct = (x: number) => `${(x * 100).toFixed(3)}%`;

/**
 * The competition day as a strip: the lake clock along the top, one lane of stops per angler (a block from
 * arrival to leaving, ragged at the right while still there) and the catches as diamonds above the lanes. It
 * is a picture for a glance; the stop list below it says the same in words, so the drawing is one image to
 * assistive technology with a summary for its name.
 */
export function DayTimeline({ model, timeZone, summary }: { model: TimelineModel; timeZone: string; summary: string }) {
  return (
    <figure className={styles.timeline}>
      <div role="img" aria-label={summary} className={styles.timelineBody}>
        <div className={styles.axis} aria-hidden>
          {model.ticks.map((t, i) => (
            <span
              key={t.label + t.at}
              className={i % 2 ? `${styles.tick} ${styles.oddTick}` : styles.tick}
              style={{ left: pct(t.at) }}
            >
              {t.label}
            </span>
          ))}
        </div>
        <div className={styles.catchRow} aria-hidden>
          {model.ticks.map((t) => (
            <span key={t.label + t.at} className={styles.gridLine} style={{ left: pct(t.at) }} />
          ))}
          {model.catches.map((c) => (
            <span
              key={c.id}
              title={`${c.label} at ${clockTime(c.caughtAt, timeZone)}${c.toCheck ? ' (to check)' : c.stopId ? '' : ' (in no stop)'}`}
              className={[styles.catchMark, c.toCheck ? styles.catchCheck : c.stopId ? '' : styles.catchLoose].join(
                ' ',
              )}
              style={{ left: pct(c.x) }}
            />
          ))}
        </div>
        {model.lanes.map((lane) => (
          <div key={lane.anglerId ?? 'all'} className={styles.lane} aria-hidden>
            {model.lanes.length > 1 ? <span className={styles.laneName}>{lane.name ?? 'Unassigned'}</span> : null}
            {model.ticks.map((t) => (
              <span key={t.label + t.at} className={styles.gridLine} style={{ left: pct(t.at) }} />
            ))}
            {lane.stops.map((s) => (
              <span
                key={s.id}
                title={`${s.label}: ${clockTime(s.arrivedAt, timeZone)}–${s.leftAt ? clockTime(s.leftAt, timeZone) : 'still there'}`}
                className={[styles.stopSpan, s.open ? styles.stopOpen : ''].join(' ')}
                style={{ left: pct(s.x0), width: `max(6px, ${pct(s.x1 - s.x0)})` }}
              >
                <span className={styles.stopName}>{s.label}</span>
              </span>
            ))}
          </div>
        ))}
      </div>
      <figcaption className={styles.legend}>
        <span>
          <span className={styles.legendStop} aria-hidden /> stop
        </span>
        <span>
          <span className={`${styles.legendStop} ${styles.stopOpen}`} aria-hidden /> still there
        </span>
        <span>
          <span className={styles.catchMark} aria-hidden /> catch
        </span>
        <span>
          <span className={`${styles.catchMark} ${styles.catchLoose}`} aria-hidden /> catch in no stop
        </span>
        <span>
          <span className={`${styles.catchMark} ${styles.catchCheck}`} aria-hidden /> catch to check
        </span>
        <Text size="small" className={styles.muted}>
          Lake clock, {timeZone.replace(/_/g, ' ')}
        </Text>
      </figcaption>
    </figure>
  );
}
