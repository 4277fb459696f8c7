import type { CrewRole } from './roles.js';

export interface CrewView {
  id: string;
  name: string;
  /** The caller's own role in this crew. */
  role: CrewRole;
  /** Whether viewers (coach, sponsor) may see exact positions. Default false. */
  viewersSeePositions: boolean;
}

export interface MemberView {
  userId: string;
  email: string;
  displayName: string;
  role: CrewRole;
  joinedAt: string;
}

export interface InviteView {
  id: string;
  email: string;
  role: CrewRole;
  expiresAt: string;
  createdAt: string;
}

/** GET /api/invites/:token — what a person sees before accepting. */
export interface InvitePreview {
  crewName: string;
  role: CrewRole;
  email: string;
  expiresAt: string;
}

export interface CreateCrewRequest {
  name: string;
}

export interface UpdateCrewRequest {
  name?: string;
  viewersSeePositions?: boolean;
}

export interface CreateInviteRequest {
  email: string;
  role: CrewRole;
}

export interface ChangeRoleRequest {
  role: CrewRole;
}

export interface AcceptInviteRequest {
  token: string;
}

/** POST /api/invites/accept */
export interface AcceptInviteResponse {
  crewId: string;
}
