import type { CrewRole } from '@shoalbook/shared';

export const CREW_ACCESS_KEY = 'shoalbook:crew-access';

export interface CrewAccessRule {
  /** The least role the route needs. */
  role: CrewRole;
  /** Name of a route parameter: a member may act on their own id whatever their role (leaving a crew). */
  orSelf?: string;
}
