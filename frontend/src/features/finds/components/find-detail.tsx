import type { LakeView, UnitPreferences } from '@shoalbook/shared';
import { Heading, Label, Text } from '@primer/react';
import { SkyContextPanel } from '../../../components/sky/sky-context-panel';
import { clockTime, localDate } from '../../../lib/lake-time';
import type { FindWithSky } from '../../../lib/journal-types';
import { formatDepth, formatTemperature } from '../../../lib/units';
import { photoUrl } from '../api/finds-api';
import { foundHowLabel, HARDNESS_LABELS, kindLabel, positionText, VEGETATION_LABELS } from './find-labels';
import styles from '../../../components/record-detail/record-detail.module.css';

/** One find in full: what was read on the sonar, where and when, its photo and the sun and moon at that moment. */
export function FindDetail({
  crewId,
  find,
  lake,
  prefs,
}: {
  crewId: string;
  find: FindWithSky;
  lake: LakeView | undefined;
  prefs: UnitPreferences;
}) {
  const zone = lake?.timeZone ?? 'UTC';
  return (
    <div className={styles.layout}>
      <section aria-labelledby="find-facts">
        <Heading as="h2" id="find-facts" className={styles.heading}>
          What was there
        </Heading>
        <p className={styles.labels}>
          <Label variant="accent">{kindLabel(find.kind)}</Label> <Label>{find.subKind}</Label>
          {find.baitSeen ? <Label variant="success">Bait seen</Label> : null}
        </p>
        <dl className={styles.grid}>
          <dt>Depth</dt>
          <dd>{formatDepth(find.depthFt, prefs.depth)}</dd>
          <dt>Hardness</dt>
          <dd>{find.hardness ? HARDNESS_LABELS[find.hardness] : 'Not graded'}</dd>
          <dt>Vegetation</dt>
          <dd>{find.vegetationDensity ? VEGETATION_LABELS[find.vegetationDensity] : 'Not noted'}</dd>
          <dt>Fish marked</dt>
          <dd>{find.fishMarked ?? '—'}</dd>
          <dt>Frequency</dt>
          <dd>{find.frequencyKhz ? `${find.frequencyKhz} kHz` : '—'}</dd>
          <dt>Found by</dt>
          <dd>{foundHowLabel(find.foundHow)}</dd>
          <dt>Water</dt>
          <dd>{formatTemperature(find.waterTempF, prefs.temperature)}</dd>
          <dt>Position</dt>
          <dd>{find.lat === null ? 'Hidden by the crew\u2019s settings' : positionText(find.lat, find.lon)}</dd>
          <dt>Marked</dt>
          <dd>
            {find.markedAt
              ? `${localDate(find.markedAt, zone)} at ${clockTime(find.markedAt, zone)}`
              : (find.practiceDate ?? 'Time not recorded')}
          </dd>
        </dl>
        {find.notes ? (
          <Text as="p" className={styles.notes}>
            {find.notes}
          </Text>
        ) : null}
      </section>
      <div className={styles.side}>
        <SkyContextPanel sky={find.sky} timeZone={zone} title="Sun and moon when marked" />
        {find.photoId ? (
          <figure className={styles.figure}>
            <img
              src={photoUrl(crewId, find.photoId)}
              alt={`Photo or sonar screenshot of ${find.name}`}
              className={styles.photo}
              loading="lazy"
            />
            <figcaption>
              <Text size="small">Attached image</Text>
            </figcaption>
          </figure>
        ) : null}
      </div>
    </div>
  );
}
