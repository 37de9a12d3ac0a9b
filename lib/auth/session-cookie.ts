/** The session cookie's name: lucia sets it (lib/auth/lucia.ts); the cross-site checks look for it. */
export const SESSION_COOKIE = "linkyard_session";
