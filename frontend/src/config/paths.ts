/**
 * Every front-end URL of Shoalbook, defined once. Route definitions use `path`, links call `href(...)`.
 * Crew sections (journal, lakes, events, finds, catches, reports) all live under /crews/:crewId/.
 */
export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: {
    path: '/sign-in',
    href: (next?: string) => (next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  },
  signUp: {
    path: '/sign-up',
    href: (next?: string, email?: string) => withQuery('/sign-up', { next, email }),
  },
  resetPassword: { path: '/reset-password', href: () => '/reset-password' },
  invite: { path: '/invite', href: (token: string) => `/invite?token=${encodeURIComponent(token)}` },
  newCrew: { path: '/crews/new', href: () => '/crews/new' },
  crew: {
    path: '/crews/:crewId',
    href: (crewId: string) => `/crews/${encodeURIComponent(crewId)}`,
  },
  crewSettings: {
    path: 'settings',
    href: (crewId: string) => `/crews/${encodeURIComponent(crewId)}/settings`,
  },
  account: { path: '/account', href: () => '/account' },
  admin: { path: '/admin', href: () => '/admin' },
  devOutbox: { path: '/dev/outbox', href: () => '/dev/outbox' },
} as const;

function withQuery(base: string, query: Record<string, string | undefined>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value) params.set(key, value);
  const qs = params.toString();
  return qs ? `${base}?${qs}` : base;
}

/**
 * Accept a post-sign-in destination only when it is a path inside this app, so a crafted
 * `?next=https://elsewhere` link cannot send someone off-site.
 */
export function safeNextPath(next: string | null | undefined): string | null {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return null;
  return next;
}
