import type { LoginResponse } from './auth.types.js';

/** RFC 6238 TOTP as authenticator apps expect it by default: SHA-1, 6 digits, 30-second steps. */
export const TOTP_DIGITS = 6;
export const TOTP_PERIOD_SECONDS = 30;
/** Single-use recovery codes handed out when a second factor is set up. */
export const RECOVERY_CODE_COUNT = 10;
/** How long the code step of a sign-in stays open after the right password. */
export const PENDING_SIGN_IN_MINUTES = 5;

/** The answer to a right password when the account has a second factor: no session yet. */
export interface SecondFactorChallenge {
  secondFactor: 'totp';
  /** Short-lived proof of the right password; only `POST /auth/login/second-factor` takes it. */
  pendingToken: string;
  expiresAt: string;
}

export type SignInResult = LoginResponse | SecondFactorChallenge;

export function needsSecondFactor(result: SignInResult): result is SecondFactorChallenge {
  return 'pendingToken' in result;
}

export interface SecondFactorSignInRequest {
  pendingToken: string;
  /** Six digits from the authenticator app, or one recovery code. */
  code: string;
}

export interface SecondFactorStatus {
  enabled: boolean;
  /** Administrators of a real install must have one. */
  required: boolean;
  recoveryCodesLeft: number;
}

/** A new secret, shown once; it counts only after a code from it is confirmed. */
export interface TotpEnrolment {
  secret: string;
  otpauthUri: string;
  /** The otpauth URI as an SVG QR code, for an `<img src>` (data URL). */
  qrCode: string;
}

export interface TotpConfirmRequest {
  code: string;
  password: string;
}

export interface RecoveryCodesResponse {
  recoveryCodes: string[];
}

/** New recovery codes replace every old one; the current password or a code from the app proves it is the owner. */
export interface RecoveryCodesRenewalRequest {
  password?: string;
  /** Six digits from the authenticator app (a recovery code does not renew the codes). */
  code?: string;
}

export interface SecondFactorRemovalRequest {
  password: string;
  /** A code from the app or a recovery code. */
  code: string;
}
