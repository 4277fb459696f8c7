import type { CrewRole, SiteRole } from '@shoalbook/shared';

/** The password of every demo account (printed by `npm start`, listed in the README). */
export const DEMO_PASSWORD = 'shoalbook-demo';

export const DEMO_CREW_NAME = 'Bluegill Flats Crew';
export const RIVAL_CREW_NAME = 'Redear Point Crew';

export interface DemoAccount {
  email: string;
  displayName: string;
  siteRole: SiteRole;
  /** Which demo crew the account belongs to, and as what. */
  crew?: { name: string; role: CrewRole };
}

/** Invented people; the e-mail addresses use the reserved `.test` domain. */
export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  {
    email: 'owner@demo.test',
    displayName: 'Wren Halvorsen',
    siteRole: 'user',
    crew: { name: DEMO_CREW_NAME, role: 'owner' },
  },
  {
    email: 'angler@demo.test',
    displayName: 'Milo Farrant',
    siteRole: 'user',
    crew: { name: DEMO_CREW_NAME, role: 'angler' },
  },
  {
    email: 'viewer@demo.test',
    displayName: 'Ines Barlow (coach)',
    siteRole: 'user',
    crew: { name: DEMO_CREW_NAME, role: 'viewer' },
  },
  { email: 'admin@demo.test', displayName: 'Site Admin', siteRole: 'admin' },
  {
    email: 'rival@demo.test',
    displayName: 'Rory Castellan',
    siteRole: 'user',
    crew: { name: RIVAL_CREW_NAME, role: 'owner' },
  },
];
