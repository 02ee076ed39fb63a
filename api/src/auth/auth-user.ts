import type { Role } from './role.enum.js';

/** Who is calling, as the guards establish it. */
export interface AuthUser {
  readonly id: number;
  readonly email: string;
  readonly name: string;
  readonly role: Role;
  readonly organisationId: number | null;
  /** Set when the call is authenticated by a personal API token rather than a sign-in. */
  readonly token?: { readonly id: number; readonly projectId: number };
}

/** JWT payload we sign; `iat` and `exp` are added by the signer and required on the way in. */
export interface JwtPayload {
  readonly sub: number;
  readonly role: Role;
  /** The browser session (sessions.id) the token was issued for; the session must still be live. */
  readonly sid: number;
  readonly iat?: number;
  readonly exp?: number;
}
