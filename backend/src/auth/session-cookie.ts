/** The session cookie's name (httpOnly, SameSite=Lax, Secure over HTTPS). */
export const SESSION_COOKIE = 'sb_session';
