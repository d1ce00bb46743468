// The session cookie's name, shared by lucia's setup and the redirecting proxy.
export const SESSION_COOKIE = 'pourproof_session';
