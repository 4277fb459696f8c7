import { DEFAULT_UNITS, type CrewRole, type UnitPreferences } from '@shoalbook/shared';
import { useMe } from './auth';
import { canWriteJournal } from './authorization';

/** What the signed-in person may do in one crew's journal, from /api/auth/me. */
export interface JournalAccess {
  role: CrewRole | undefined;
  /** Owners and anglers write; viewers (coach, sponsor) only read. */
  canWrite: boolean;
  /** Exports and file imports carry positions: owners and anglers only, per the journal contract. */
  canExport: boolean;
}

export function useJournalAccess(crewId: string): JournalAccess {
  const { data } = useMe();
  const role = data?.crews.find((c) => c.crewId === crewId)?.role;
  const canWrite = canWriteJournal(role);
  return { role, canWrite, canExport: canWrite };
}

/** The signed-in person's unit preferences (UserView.units), or the defaults before /me has answered. */
export function useUnitPreferences(): UnitPreferences {
  const { data } = useMe();
  return data?.user.units ?? DEFAULT_UNITS;
}
