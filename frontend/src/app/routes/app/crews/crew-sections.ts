import { BookIcon, GearIcon, GraphIcon, type Icon } from '@primer/octicons-react';
import type { CrewRole } from '@shoalbook/shared';
import { paths } from '../../../../config/paths';
import { JOURNAL_SECTIONS } from './journal/journal-sections';

/**
 * The sections of a crew, in navigation order. Each is a child route of /crews/:crewId. To add one
 * (lakes, events, finds, catches, reports): add its route in router.tsx and an entry here.
 */
export interface CrewSection {
  id: string;
  label: string;
  icon: Icon;
  href: (crewId: string) => string;
  /** Whether the path must match exactly (the journal is the crew's index route). */
  end: boolean;
  /** Roles that see the section; all members when omitted. */
  roles?: readonly CrewRole[];
}

export const CREW_SECTIONS: readonly CrewSection[] = [
  { id: 'journal', label: 'Journal', icon: BookIcon, href: paths.crew.href, end: true },
  ...JOURNAL_SECTIONS,
  {
    id: 'reports',
    label: 'Reports',
    icon: GraphIcon,
    href: (crewId: string) => `${paths.crew.href(crewId)}/reports`,
    end: false,
  },
  { id: 'settings', label: 'Crew & members', icon: GearIcon, href: paths.crewSettings.href, end: false },
];
