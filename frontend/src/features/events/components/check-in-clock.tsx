import type { CompetitionDayView, DepthUnit, LakeView, RampPosition } from '@shoalbook/shared';
import { localDateOf } from '@shoalbook/shared';
import { Button, FormControl, Heading, Text, TextInput } from '@primer/react';
import { useEffect, useId, useState } from 'react';
import { RunBackCaution } from '../../../components/cautions/journal-cautions';
import { fixRefusedText, LOCATING_TEXT } from '../../../components/journal-forms/position-from-phone';
import {
  isPositiveNumber,
  readDeviceSetting,
  useSavedNumberField,
  writeDeviceSetting,
} from '../../../lib/device-setting';
import { clockTime } from '../../../lib/lake-time';
import { formatLongDistance, formatShortDistance, mpsToSpeed, SPEED_SIGNS, speedToMps } from '../../../lib/units';
import { savedFixLimitM, usePosition, type PositionStatus } from '../../../lib/use-position';
import { checkInAt, durationText, runBack, runMinutes } from './check-in-clock-model';
import styles from './check-in-clock.module.css';
import thumb from '../../../components/journal-forms/thumb.module.css';

/** The boat's cruising speed belongs to this phone's angler and boat, not the account (metres per second). */
const CRUISE_KEY = 'shoalbook.cruiseMps';
/** Often enough for a count in whole minutes. */
const TICK_MS = 15_000;

const speedText = (mps: number, unit: DepthUnit) => String(Math.round(mpsToSpeed(mps, unit) * 10) / 10);
const systemNow = () => new Date();

function locatingSaid(status: PositionStatus, unit: DepthUnit): string | null {
  if (status.kind === 'locating') return LOCATING_TEXT;
  if (status.kind === 'failed') return status.message;
  if (status.kind === 'too-coarse')
    return `${fixRefusedText(status, unit)} (the limit is set in the catch and stop forms).`;
  return null;
}

/**
 * The clock to check-in on the competition day itself: time left, and with the event's ramp, the phone's position
 * and the boat's cruising speed, when to start back. Everything is worked out on the phone, so it runs offline.
 */
export function CheckInClock({
  day,
  lake,
  ramp,
  unit,
  now = systemNow,
}: {
  day: Pick<CompetitionDayView, 'date' | 'checkInTime'>;
  lake: Pick<LakeView, 'timeZone'>;
  /** The event's launch and check-in ramp, if given. */
  ramp: RampPosition | null;
  /** The user's depth unit: feet users get miles and mph, metre users kilometres and km/h. */
  unit: DepthUnit;
  now?: () => Date;
}) {
  const [at, setAt] = useState(now);
  useEffect(() => {
    const timer = setInterval(() => setAt(now()), TICK_MS);
    return () => clearInterval(timer);
  }, [now]);
  const position = usePosition();
  const speed = useSavedNumberField({
    saved: () => readDeviceSetting<number | null>(CRUISE_KEY, isPositiveNumber, null),
    show: (mps) => speedText(mps, unit),
    toStored: (typed) => speedToMps(typed, unit),
    save: (mps) => writeDeviceSetting(CRUISE_KEY, mps),
  });
  const headingId = useId();

  if (localDateOf(at, lake.timeZone) !== day.date) return null;
  const checkIn = checkInAt(day, lake.timeZone);

  const speedMps = speed.value;
  const speedError = speed.text.trim() !== '' && speedMps === null;

  const body = () => {
    if (!checkIn)
      return (
        <Text as="p" className={styles.muted}>
          No check-in time for this day yet: give it under &ldquo;Start, check-in, weather and water of this day&rdquo;.
        </Text>
      );
    const left = checkIn.getTime() - at.getTime();
    if (left <= 0)
      return (
        <p className={styles.countdown}>
          Check-in was at {clockTime(checkIn, lake.timeZone)}, {durationText(-left)} ago.
        </p>
      );
    const fix = position.lastFix;
    const run = fix && ramp && speedMps !== null ? runBack(fix, ramp, speedMps, checkIn) : null;
    const missing = [
      ramp ? null : 'the event’s launch ramp (in the event’s details)',
      speedMps === null ? 'your cruising speed' : null,
      fix ? null : 'this phone’s position',
    ].filter(Boolean);
    const locating = locatingSaid(position.status, unit);
    return (
      <>
        <p className={styles.countdown} role="timer">
          {durationText(left)} to check-in at {clockTime(checkIn, lake.timeZone)}
        </p>
        {run ? (
          <>
            <p className={styles.leave}>
              {run.leaveBy.getTime() <= at.getTime()
                ? `Leave now: the run takes about ${runMinutes(run.runSeconds)} min.`
                : `Leave by ${clockTime(run.leaveBy, lake.timeZone)}`}
            </p>
            <Text as="p" size="small" className={styles.plain}>
              The ramp is {formatLongDistance(run.distanceM, unit)} away in a straight line, about{' '}
              {runMinutes(run.runSeconds)} min at {speedText(speedMps!, unit)} {SPEED_SIGNS[unit]}, from your position
              at {clockTime(new Date(fix!.at), lake.timeZone)} (±{formatShortDistance(fix!.accuracyM, unit)}).
            </Text>
          </>
        ) : (
          <Text as="p" size="small" className={styles.muted}>
            For a leave-by time this needs {missing.join(', ')}.
          </Text>
        )}
        <div className={styles.inputs}>
          <FormControl id={`${headingId}-speed`}>
            <FormControl.Label>Cruising speed ({SPEED_SIGNS[unit]})</FormControl.Label>
            <TextInput
              name="cruisingSpeed"
              value={speed.text}
              onChange={(e) => speed.change(e.target.value)}
              inputMode="decimal"
              autoComplete="off"
              className={styles.speed}
              validationStatus={speedError ? 'error' : undefined}
            />
            {speedError ? (
              <FormControl.Validation variant="error">
                A speed above 0, like {unit === 'm' ? 60 : 40}.
              </FormControl.Validation>
            ) : (
              <FormControl.Caption>Kept on this phone</FormControl.Caption>
            )}
          </FormControl>
          {position.supported ? (
            <Button
              type="button"
              className={styles.button}
              loading={position.status.kind === 'locating'}
              onClick={() => void position.locate(savedFixLimitM())}
            >
              Locate for the run back
            </Button>
          ) : null}
        </div>
        <p role="status" aria-live="polite" className={styles.said}>
          {locating ? <Text size="small">{locating}</Text> : null}
        </p>
        <RunBackCaution />
      </>
    );
  };

  return (
    <section aria-labelledby={headingId} className={`${styles.panel} ${thumb.thumb}`}>
      <Heading as="h3" id={headingId} className={styles.heading}>
        Check-in
      </Heading>
      {body()}
    </section>
  );
}
