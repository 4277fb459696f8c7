/**
 * The authorisation matrix's expectations, as data. Each route of the OpenAPI document is called as
 * each actor; the answer is classified and compared with the row below.
 *
 * - Routes under /api/crews/{crewId}/… need no row: the crew default applies (members read, owners
 *   and anglers write, viewers 403, everyone else 404, anonymous 401). Add a row to OWNER_ONLY or
 *   OVERRIDES only where a crew route differs.
 * - Every other route needs a row in OVERRIDES; the test fails for a route without one.
 */
export const ACTORS = ['anonymous', 'nonMember', 'viewer', 'angler', 'owner', 'admin'] as const;
export type Actor = (typeof ACTORS)[number];

/** passed = got past authorisation (any answer below 500 that is not a refusal). */
export type Outcome = 'passed' | 'anon' | 'forbidden' | 'hidden';
export type Expectation = Record<Actor, Outcome>;

const everyone: Expectation = {
  anonymous: 'passed',
  nonMember: 'passed',
  viewer: 'passed',
  angler: 'passed',
  owner: 'passed',
  admin: 'passed',
};
const signedIn: Expectation = { ...everyone, anonymous: 'anon' };
const adminOnly: Expectation = {
  anonymous: 'anon',
  nonMember: 'forbidden',
  viewer: 'forbidden',
  angler: 'forbidden',
  owner: 'forbidden',
  admin: 'passed',
};
const crewRead: Expectation = {
  anonymous: 'anon',
  nonMember: 'hidden',
  admin: 'hidden',
  viewer: 'passed',
  angler: 'passed',
  owner: 'passed',
};
const crewWrite: Expectation = { ...crewRead, viewer: 'forbidden' };
const crewOwner: Expectation = { ...crewWrite, angler: 'forbidden' };

/** Crew routes only owners may use (keys: "METHOD /api/path" as in the OpenAPI document). */
export const OWNER_ONLY = [
  'PATCH /api/crews/{crewId}',
  // Sent without a body here (400 after authorisation); the deletion itself is tested in crew-account-deletion.e2e-spec.
  'DELETE /api/crews/{crewId}',
  'PATCH /api/crews/{crewId}/members/{userId}',
  // The target is another member; leaving (own id) is allowed to all and tested in crews.e2e-spec.
  'DELETE /api/crews/{crewId}/members/{userId}',
  'GET /api/crews/{crewId}/invites',
  'POST /api/crews/{crewId}/invites',
  'DELETE /api/crews/{crewId}/invites/{inviteId}',
  // Sent without a body here (400 after authorisation); the hand-over itself is tested in crews.e2e-spec.
  'POST /api/crews/{crewId}/hand-over',
];

export const OVERRIDES: Record<string, Expectation> = {
  'GET /api/health': everyone,
  'GET /api/auth/csrf': everyone,
  'POST /api/auth/sign-up': everyone,
  'POST /api/auth/sign-in': everyone,
  'POST /api/auth/sign-out': everyone,
  'POST /api/auth/password-reset/request': everyone,
  'POST /api/auth/password-reset/confirm': everyone,
  'GET /api/auth/me': signedIn,
  'PATCH /api/auth/me': signedIn,
  'DELETE /api/auth/me': signedIn,
  'POST /api/auth/change-password': signedIn,
  'GET /api/crews': signedIn,
  'POST /api/crews': signedIn,
  'GET /api/invites/{token}': everyone,
  'POST /api/invites/accept': signedIn,
  'GET /api/admin/users': adminOnly,
  'PATCH /api/admin/users/{userId}': adminOnly,
  'POST /api/admin/projections/rebuild': adminOnly,
  'GET /api/dev/outbox': everyone,
  // Journal exports carry positions: owners and anglers only, even though they are GETs.
  'GET /api/crews/{crewId}/export.json': crewWrite,
  'GET /api/crews/{crewId}/export.csv': crewWrite,
  'GET /api/crews/{crewId}/lakes/{lakeId}/finds.gpx': crewWrite,
};

/** The expectation for a route, or undefined when it needs a row. */
export function expectationFor(key: string): Expectation | undefined {
  if (OVERRIDES[key]) return OVERRIDES[key];
  const [method, path] = key.split(' ') as [string, string];
  if (!path.startsWith('/api/crews/{crewId}')) return undefined;
  if (OWNER_ONLY.includes(key)) return crewOwner;
  return method === 'GET' || method === 'HEAD' ? crewRead : crewWrite;
}
