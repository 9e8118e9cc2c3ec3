import type { Language } from '../i18n/words.js';
import type { StageNumbering } from '../breeding/brood-stage.js';
import type { AcceptInvitationResponse } from '../projects/invitations.types.js';
export const ACCOUNT_ROLES = ['keeper', 'admin'] as const;
export type AccountRole = (typeof ACCOUNT_ROLES)[number];

export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];

export const MIN_PASSWORD_LENGTH = 10;

export interface RegisterRequest {
  email: string;
  password: string;
  displayName: string;
  timeZone?: string;
  /** The browser's language at registration, when Broodsilk speaks it. */
  language?: Language;
  /** The token of the invitation link that led here; confirming the address accepts it. */
  invitationToken?: string;
}

/** `POST /auth/register` answers 202 with this, the same for a new and a taken address; nobody is signed in. */
export interface RegisterResponse {
  message: string;
}

/** How long the link in the confirmation e-mail works. */
export const EMAIL_CONFIRMATION_HOURS = 24;

/** How long the link in the password-reset e-mail works. */
export const RESET_LINK_MINUTES = 45;

export interface EmailConfirmationRequest {
  token: string;
}

export interface EmailConfirmationResendRequest {
  email: string;
}

/** What confirming the address did: a session (none when the account also needs a second factor), and the invitation it carried. */
export interface EmailConfirmationResult {
  session: LoginResponse | null;
  invitation: AcceptInvitationResponse | null;
  /** Why the carried invitation could not be used (expired, replaced, already accepted). */
  invitationProblem?: string;
}

/** `reason` of the 403 a right password gets before the address is confirmed. */
export const EMAIL_NOT_CONFIRMED = 'email-not-confirmed';

export interface LoginRequest {
  email: string;
  password: string;
}

export interface PasswordResetRequest {
  email: string;
}

export interface PasswordResetConfirmRequest {
  token: string;
  password: string;
}

/** The signed-in user, as `GET /api/auth/me` returns it. */
export interface Me {
  id: string;
  email: string;
  displayName: string;
  role: AccountRole;
  timeZone: string;
  temperatureUnit: TemperatureUnit;
  /** A TOTP second factor is set up. */
  secondFactorEnabled: boolean;
  /** The account must set one up before it may use administrator pages. */
  secondFactorRequired: boolean;
  /** Interface language, e-mails, statements and the calendar feed. */
  language: Language;
  /** Which stage-numbering set names the brood stages (docs/rules.md, Stage numbering). */
  stageNumbering: StageNumbering;
}

export interface LoginResponse {
  user: Me;
  /** The same JWT the session cookie carries, for API clients that send `Authorization: Bearer`. */
  accessToken: string;
  /** Token for the `x-csrf-token` header on cookie-authenticated writes. */
  csrfToken: string;
  expiresAt: string;
}

export interface CsrfResponse {
  csrfToken: string;
}

export const SESSION_COOKIE = 'broodsilk_session';
export const CSRF_HEADER = 'x-csrf-token';
export const SESSION_HOURS = 12;
