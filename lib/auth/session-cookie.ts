// The session cookie's name, shared by the session adapter (which seals and opens it) and the
// proxy (which only checks that one is present).
export const SESSION_COOKIE = 'hm_session';
