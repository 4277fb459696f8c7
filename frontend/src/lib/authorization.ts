import { roleAtLeast, type CrewRole } from '@shoalbook/shared';

/** Owners and anglers write the crew's journal; viewers (coach, sponsor) only read. */
export function canWriteJournal(role: CrewRole | undefined): boolean {
  return role !== undefined && roleAtLeast(role, 'angler');
}

/** Only owners manage members, invites and the crew's settings. */
export function canManageCrew(role: CrewRole | undefined): boolean {
  return role === 'owner';
}

/** Words for each role, as shown to people. */
export const ROLE_LABELS: Record<CrewRole, string> = {
  owner: 'Owner',
  angler: 'Angler',
  viewer: 'Viewer',
};

/** What each role may do, in one line, for invite and role pickers. */
export const ROLE_DESCRIPTIONS: Record<CrewRole, string> = {
  owner: 'Runs the crew: members, invites and settings, plus the journal.',
  angler: 'Logs and edits finds, catches and events in the journal.',
  viewer: 'Reads the journal and reports only, for a coach or sponsor.',
};
