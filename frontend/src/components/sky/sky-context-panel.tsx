import { Heading, Text } from '@primer/react';
import { clockOrDash } from '../../lib/lake-time';
import type { SkyContext } from '../../lib/journal-types';
import { moonPhaseName } from './moon-phase';
import styles from './sky-context-panel.module.css';

/**
 * Sun and moon around a find or a catch, on the lake's clock: the light, the moon, and whether the
 * moment fell in a solunar period (major around a moon transit, minor around moonrise or moonset).
 */
export function SkyContextPanel({
  sky,
  timeZone,
  title = 'Sun and moon',
}: {
  sky: SkyContext | null | undefined;
  timeZone: string;
  title?: string;
}) {
  if (!sky) {
    return (
      <section className={styles.panel} aria-label={title}>
        <Heading as="h3" className={styles.heading}>
          {title}
        </Heading>
        <Text as="p" size="small">
          No time was recorded, so there is no sun and moon context. Add the time it was marked to see it.
        </Text>
      </section>
    );
  }
  const period = sky.period
    ? `${sky.period.kind === 'major' ? 'Major' : 'Minor'} period, ${clockOrDash(sky.period.start, timeZone)}–${clockOrDash(sky.period.end, timeZone)}`
    : 'Outside the solunar periods';
  return (
    <section className={styles.panel} aria-label={title}>
      <Heading as="h3" className={styles.heading}>
        {title}
      </Heading>
      <dl className={styles.grid}>
        <dt>Sunrise</dt>
        <dd>{clockOrDash(sky.sunrise, timeZone)}</dd>
        <dt>Sunset</dt>
        <dd>{clockOrDash(sky.sunset, timeZone)}</dd>
        <dt>Moonrise</dt>
        <dd>{clockOrDash(sky.moonrise, timeZone)}</dd>
        <dt>Moonset</dt>
        <dd>{clockOrDash(sky.moonset, timeZone)}</dd>
        <dt>Moon</dt>
        <dd>
          {moonPhaseName(sky.moonPhase)}, {Math.round(sky.moonIllumination * 100)}% lit
        </dd>
        <dt>Solunar</dt>
        <dd>{period}</dd>
      </dl>
      <Text as="p" size="small" className={styles.note}>
        Times on the lake&rsquo;s clock ({timeZone}).
      </Text>
    </section>
  );
}
