import type { CrewAccess } from '../crews/access/request-context';

/** Owners and anglers always see positions; viewers only when the crew allows it (default: no). */
export function canSeePositions(access: CrewAccess): boolean {
  return access.role !== 'viewer' || access.crew.viewersSeePositions;
}
