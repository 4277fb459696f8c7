import type { UnitPreferences, WeighInHistoryField } from '@shoalbook/shared';
import { RecordHistory, type FigureWording } from '../../../components/record-history/record-history';
import { formatWeight } from '../../../lib/units';
import { useWeighInHistory } from '../api/weigh-ins-api';

/** The official form's own names for its figures, so the history reads like the form. */
const LABELS: Record<WeighInHistoryField, string> = {
  grossLb: 'Gross on the scale',
  penaltyLb: 'Penalties',
  officialLb: 'Official weight',
  lateMinutes: 'Minutes late',
  dayPlace: 'Day place',
  fieldSize: 'Field size',
  winningLb: 'Winning weight',
  cutLb: 'Cut weight',
};
const WEIGHTS = new Set<WeighInHistoryField>(['grossLb', 'penaltyLb', 'officialLb', 'winningLb', 'cutLb']);

/** Every change to a day's official figures, with who entered it and when. */
export function WeighInHistory({
  crewId,
  eventId,
  dayId,
  date,
  prefs,
  timeZone,
}: {
  crewId: string;
  eventId: string;
  dayId: string;
  date: string;
  prefs: UnitPreferences;
  timeZone: string;
}) {
  const history = useWeighInHistory(crewId, eventId, dayId);
  const wording: FigureWording<WeighInHistoryField> = {
    label: (field) => LABELS[field],
    value: (field, n) => (WEIGHTS.has(field) ? formatWeight(n, prefs.weight) : String(n)),
  };
  return (
    <RecordHistory
      title="History of the official figures"
      headingId={`weigh-in-history-${dayId}`}
      changes={history.data}
      error={history.error}
      wording={wording}
      timeZone={timeZone}
      recordDay={date}
    />
  );
}
