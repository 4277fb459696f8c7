/** A member's role within one crew. Owners manage the crew; anglers read and write the journal; viewers only read. */
export const CREW_ROLES = ['owner', 'angler', 'viewer'] as const;
export type CrewRole = (typeof CREW_ROLES)[number];

/** Site-wide role. An admin manages accounts; it opens no crew's journal. */
export const SITE_ROLES = ['user', 'admin'] as const;
export type SiteRole = (typeof SITE_ROLES)[number];

/** Roles that may change the crew's journal. */
export const WRITER_ROLES: readonly CrewRole[] = ['owner', 'angler'];

/** True when `role` carries at least the rights of `needed` (owner ⊇ angler ⊇ viewer). */
export function roleAtLeast(role: CrewRole, needed: CrewRole): boolean {
  return CREW_ROLES.indexOf(role) <= CREW_ROLES.indexOf(needed);
}
