/**
 * Cookie names. Over HTTPS they carry the `__Host-` prefix (RFC 6265bis section 4.1.3.2: such a cookie must
 * be Secure, have Path=/ and no Domain, so it is bound to this one host and no sibling subdomain or plain-HTTP
 * page can set or shadow it). Browsers refuse to store a `__Host-` cookie without TLS, so on loopback HTTP
 * (npm start, the tests) the plain names stay. See docs/deploy.md.
 */
export function cookieName(base: 'sb_session' | 'sb_csrf', https: boolean): string {
  return https ? `__Host-${base}` : base;
}

/** The session cookie's base name (httpOnly, SameSite=Lax, Secure and __Host- over HTTPS). */
export const SESSION_COOKIE = 'sb_session';
