import { MEAN_EARTH_RADIUS_M, nearestFind, units } from '@shoalbook/analytics';
import { DEFAULT_ATTRIBUTION_RADIUS_M, type DepthUnit, type FindView } from '@shoalbook/shared';
import { Button, FormControl, Text, TextInput } from '@primer/react';
import { useId, useState } from 'react';
import { useSavedNumberField } from '../../lib/device-setting';
import { formatShortDistance, UNIT_SIGNS } from '../../lib/units';
import {
  DEFAULT_FIX_LIMIT_M,
  NO_GEOLOCATION_MESSAGE,
  saveFixLimitM,
  savedFixLimitM,
  usePosition,
  type PositionFix,
  type PositionStatus,
} from '../../lib/use-position';
import styles from './position-from-phone.module.css';

/** Half the Earth's circumference: no two positions are farther apart, so every find is a candidate. */
const ANYWHERE_M = Math.PI * MEAN_EARTH_RADIUS_M;

export interface NearestFindOf {
  find: FindView;
  distanceM: number;
  /** Within the attribution radius (the server's rule for catches by coordinates): the find to pick. */
  picked: boolean;
}

/** The nearest find with a known position, by great-circle distance; null when none has one. */
export function nearestFindTo(fix: Pick<PositionFix, 'lat' | 'lon'>, finds: FindView[]): NearestFindOf | null {
  const placed = finds.filter((f): f is FindView & { lat: number; lon: number } => f.lat !== null && f.lon !== null);
  const hit = nearestFind(fix, placed, ANYWHERE_M);
  return hit ? { ...hit, picked: hit.distanceM <= DEFAULT_ATTRIBUTION_RADIUS_M } : null;
}

const limitText = (m: number, unit: DepthUnit) => String(Math.round(unit === 'm' ? m : units.mToFt(m)));

export const LOCATING_TEXT = 'Asking the phone for its position…';

/** A fix coarser than the angler's limit, in words (the screen adds what to do about it). */
export function fixRefusedText(status: Extract<PositionStatus, { kind: 'too-coarse' }>, unit: DepthUnit): string {
  const d = (m: number) => formatShortDistance(m, unit);
  return `Fix refused: the phone is only sure to ±${d(status.accuracyM)}, worse than the ±${d(status.limitM)} you accept`;
}

function said(status: PositionStatus, nearest: NearestFindOf | null, unit: DepthUnit): string | null {
  const d = (m: number) => formatShortDistance(m, unit);
  if (status.kind === 'locating') return LOCATING_TEXT;
  if (status.kind === 'failed') return `${status.message} The form works without it.`;
  if (status.kind === 'too-coarse')
    return `${fixRefusedText(status, unit)}. Try again in the open, or widen the limit.`;
  if (status.kind !== 'fix') return null;
  const where = `Position filled, accurate to ±${d(status.fix.accuracyM)}`;
  if (!nearest) return `${where}; no find of this lake has a position.`;
  const name = `nearest find: ${nearest.find.name}, ${d(nearest.distanceM)}`;
  return nearest.picked
    ? `${where}; ${name}.`
    : `${where}; ${name}, farther than ${d(DEFAULT_ATTRIBUTION_RADIUS_M)}, so no find is picked.`;
}

/**
 * "Use my position" for the catch and stop forms: a fix from the phone (no coarser than the angler's limit,
 * 30 m unless changed; the limit stays on this device), and the nearest find of the lake. `onFix` gets the
 * fix and that find; the form decides what to fill. Without the API or without permission it says so.
 */
export function PositionFromPhone({
  finds,
  unit,
  onFix,
}: {
  finds: FindView[];
  /** The user's depth unit (ft or m) for accuracy and distances. */
  unit: DepthUnit;
  onFix: (fix: PositionFix, nearest: NearestFindOf | null) => void;
}) {
  const position = usePosition();
  const limit = useSavedNumberField({
    saved: savedFixLimitM,
    show: (m) => limitText(m, unit),
    toStored: (typed) => (unit === 'm' ? typed : units.ftToM(typed)),
    save: saveFixLimitM,
  });
  const limitM = limit.value;
  const [nearest, setNearest] = useState<NearestFindOf | null>(null);
  const id = useId();

  if (!position.supported) {
    return (
      <Text as="p" size="small" className={styles.said}>
        {NO_GEOLOCATION_MESSAGE}
      </Text>
    );
  }

  const locate = async () => {
    if (limitM === null) return;
    const fix = await position.locate(limitM);
    if (!fix) return;
    const found = nearestFindTo(fix, finds);
    setNearest(found);
    onFix(fix, found);
  };
  const message = said(position.status, nearest, unit);
  const refused = position.status.kind === 'too-coarse' || position.status.kind === 'failed';

  return (
    <div className={styles.position}>
      <Button
        type="button"
        className={styles.button}
        onClick={() => void locate()}
        loading={position.status.kind === 'locating'}
        disabled={limitM === null}
      >
        Use my position
      </Button>
      <FormControl id={`${id}-limit`}>
        <FormControl.Label>Accept fixes within ({UNIT_SIGNS[unit]})</FormControl.Label>
        <TextInput
          name="fixLimit"
          value={limit.text}
          onChange={(e) => limit.change(e.target.value)}
          inputMode="decimal"
          autoComplete="off"
          className={styles.limit}
          validationStatus={limitM === null ? 'error' : undefined}
        />
        {limitM === null ? (
          <FormControl.Validation variant="error">
            A distance above 0, like {limitText(DEFAULT_FIX_LIMIT_M, unit)}.
          </FormControl.Validation>
        ) : null}
      </FormControl>
      <p role="status" aria-live="polite" className={`${styles.said} ${refused ? styles.refused : ''}`}>
        {message ? <Text size="small">{message}</Text> : null}
      </p>
    </div>
  );
}
