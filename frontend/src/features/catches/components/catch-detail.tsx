import { SPECIES_LABELS, type UnitPreferences } from '@shoalbook/shared';
import { Heading, Label, Text } from '@primer/react';
import type { ReactNode } from 'react';
import { SkyContextPanel } from '../../../components/sky/sky-context-panel';
import { clockTime, dayLabel } from '../../../lib/lake-time';
import type { CatchWithSky } from '../../../lib/journal-types';
import { photoUrl } from '../../../lib/photos';
import { formatDepth, formatLength, formatTemperature, formatWeight } from '../../../lib/units';
import { FATE_LABELS } from './catch-labels';
import styles from '../../../components/record-detail/record-detail.module.css';

/** Where a catch came from, in words: the find (and how far, when matched from coordinates). */
export function catchSource(c: CatchWithSky): string {
  if (!c.findId) return c.lat !== null ? 'No find within the radius of its coordinates' : 'No find recorded';
  const name = c.findName ?? 'A find';
  return c.attributionDistanceM !== null
    ? `${name} (matched from coordinates, ${Math.round(c.attributionDistanceM)} m away)`
    : name;
}

/** The facts of a catch for readers (viewers see this instead of the edit form). */
export function CatchFacts({
  catchView: c,
  prefs,
  timeZone,
}: {
  catchView: CatchWithSky;
  prefs: UnitPreferences;
  timeZone: string;
}) {
  return (
    <section aria-labelledby="catch-facts">
      <Heading as="h3" id="catch-facts" className={styles.heading}>
        The fish
      </Heading>
      <dl className={styles.grid}>
        <dt>Time</dt>
        <dd>
          {clockTime(c.caughtAt, timeZone)}, {dayLabel(c.competitionDate)}
        </dd>
        <dt>Species</dt>
        <dd>{SPECIES_LABELS[c.species]}</dd>
        <dt>Weight</dt>
        <dd>
          {formatWeight(c.weightLb, prefs.weight)}
          {c.weightFlagged ? (
            <>
              {' '}
              <Label variant="attention">Check this weight</Label>
            </>
          ) : null}
        </dd>
        <dt>Length</dt>
        <dd>{formatLength(c.lengthIn, prefs.length)}</dd>
        <dt>Fate</dt>
        <dd>{FATE_LABELS[c.fate]}</dd>
        <dt>Find</dt>
        <dd>{catchSource(c)}</dd>
        <dt>Lure</dt>
        <dd>{c.lure || '—'}</dd>
        <dt>Technique</dt>
        <dd>{c.technique || '—'}</dd>
        <dt>Depth</dt>
        <dd>{formatDepth(c.depthFt, prefs.depth)}</dd>
        <dt>Water</dt>
        <dd>{formatTemperature(c.waterTempF, prefs.temperature)}</dd>
      </dl>
      {c.notes ? (
        <Text as="p" className={styles.notes}>
          {c.notes}
        </Text>
      ) : null}
    </section>
  );
}

/** The side of a catch's page: the sun and moon at that moment, and its photo. */
export function CatchSide({
  crewId,
  catchView: c,
  timeZone,
  children,
}: {
  crewId: string;
  catchView: CatchWithSky;
  timeZone: string;
  children?: ReactNode;
}) {
  return (
    <div className={styles.side}>
      <SkyContextPanel sky={c.sky} timeZone={timeZone} title="Sun and moon at the catch" />
      {c.photoId ? (
        <figure className={styles.figure}>
          <img
            src={photoUrl(crewId, c.photoId)}
            alt={`Photo of ${SPECIES_LABELS[c.species].toLowerCase()} caught at ${clockTime(c.caughtAt, timeZone)}`}
            className={styles.photo}
            loading="lazy"
          />
          <figcaption>
            <Text size="small">Photo of the catch (location data removed)</Text>
          </figcaption>
        </figure>
      ) : null}
      {children}
    </div>
  );
}
