import type { CrewRole } from '@shoalbook/shared';
import type { Session } from '../../auth/session.entity';
import type { Crew } from '../crew.entity';
import type { User } from '../../users/user.entity';

/** What the crew guard learned about the caller's membership, for the handler to scope its queries by. */
export interface CrewAccess {
  crewId: string;
  crew: Crew;
  role: CrewRole;
  userId: string;
}

declare module 'express-serve-static-core' {
  interface Request {
    /** Set by the request-id middleware; quoted in error answers and logs. */
    id: string;
    /** The signed-in account, set by the session guard. */
    user?: User;
    authSession?: Session;
    /** Set by CrewMemberGuard on crew routes. */
    crewAccess?: CrewAccess;
  }
}
