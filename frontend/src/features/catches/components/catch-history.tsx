import type { CatchHistoryField, UnitPreferences } from '@shoalbook/shared';
import { RecordHistory, type FigureWording } from '../../../components/record-history/record-history';
import { formatLength, formatWeight } from '../../../lib/units';
import { useCatchHistory } from '../api/catches-api';

const LABELS: Record<CatchHistoryField, string> = { weightLb: 'Weight', lengthIn: 'Length' };

/** The catch's weight and length as first recorded and every change since, with who and when. */
export function CatchHistory({
  crewId,
  catchId,
  competitionDate,
  prefs,
  timeZone,
}: {
  crewId: string;
  catchId: string;
  competitionDate: string;
  prefs: UnitPreferences;
  timeZone: string;
}) {
  const history = useCatchHistory(crewId, catchId);
  const wording: FigureWording<CatchHistoryField> = {
    label: (field) => LABELS[field],
    value: (field, n) => (field === 'weightLb' ? formatWeight(n, prefs.weight) : formatLength(n, prefs.length)),
  };
  return (
    <RecordHistory
      title="History of this catch"
      headingId={`catch-history-${catchId}`}
      changes={history.data}
      error={history.error}
      wording={wording}
      timeZone={timeZone}
      recordDay={competitionDate}
    />
  );
}
