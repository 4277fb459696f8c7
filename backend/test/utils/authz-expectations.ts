/**
 * The authorisation matrix's expectations, as data. Each route of the OpenAPI document is called as
 * each actor; the answer is classified and compared with the row below.
 *
 * - Routes under /api/crews/{crewId}/… need no row: the crew default applies (members read, owners
 *   and anglers write, viewers 403, everyone else 404, anonymous 401). Add a row to OWNER_ONLY or
 *   OVERRIDES only where a crew route differs.
 * - Every other route needs a row in OVERRIDES, or in PROFILE_ROWS when who may call it depends on the
 *   profile; the test fails for a route without one. Routes are taken from the OpenAPI document and from
 *   Nest's router (Express's route table), so a route left out of the document needs a row too.
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
  // Journal exports carry positions: owners and anglers only, even though they are GETs.
  'GET /api/crews/{crewId}/export.json': crewWrite,
  'GET /api/crews/{crewId}/export.csv': crewWrite,
  'GET /api/crews/{crewId}/lakes/{lakeId}/finds.gpx': crewWrite,
};

export type Profile = 'development' | 'test' | 'production';

/**
 * Routes whose audience depends on the profile (NODE_ENV); 'absent' = not mounted, 404 for everyone.
 * The development mail page holds reset and invite links: development only, site admins only. The API docs:
 * open in development and test, site admins only in production (OWASP ASVS 4.0.3 14.3.2).
 */
export const PROFILE_ROWS: Record<string, Record<Profile, Expectation | 'absent'>> = {
  'GET /api/dev/outbox': { development: adminOnly, test: 'absent', production: 'absent' },
  'GET /api/docs': { development: everyone, test: everyone, production: adminOnly },
  'GET /api/docs-json': { development: everyone, test: everyone, production: adminOnly },
};

/** The expectation for a route in the test profile, or undefined when it needs a row. */
export function expectationFor(key: string): Expectation | undefined {
  const byProfile = PROFILE_ROWS[key]?.test;
  if (byProfile) return byProfile === 'absent' ? undefined : byProfile;
  if (OVERRIDES[key]) return OVERRIDES[key];
  const [method, path] = key.split(' ') as [string, string];
  if (!path.startsWith('/api/crews/{crewId}')) return undefined;
  if (OWNER_ONLY.includes(key)) return crewOwner;
  return method === 'GET' || method === 'HEAD' ? crewRead : crewWrite;
}
