import { CalendarIcon, FileIcon, LocationIcon, MilestoneIcon, ZapIcon } from '@primer/octicons-react';
import { journalPaths } from '../../../../../config/journal-paths';
import type { CrewSection } from '../crew-sections';

/** The journal's entries in the crew's section navigation (spread into CREW_SECTIONS). */
export const JOURNAL_SECTIONS: readonly CrewSection[] = [
  { id: 'lakes', label: 'Lakes', icon: MilestoneIcon, href: journalPaths.lakes.href, end: false },
  { id: 'events', label: 'Events', icon: CalendarIcon, href: journalPaths.events.href, end: false },
  { id: 'finds', label: 'Finds', icon: LocationIcon, href: journalPaths.finds.href, end: false },
  { id: 'catches', label: 'Catches', icon: ZapIcon, href: journalPaths.catches.href, end: false },
  {
    id: 'files',
    label: 'Files',
    icon: FileIcon,
    href: (crewId) => journalPaths.import.href(crewId),
    end: false,
    roles: ['owner', 'angler'],
  },
];
