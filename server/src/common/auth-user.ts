import type { AccountRole } from '@broodsilk/shared';

/** What a request knows about its caller once the session is checked. */
export interface AuthUser {
  id: string;
  email: string;
  role: AccountRole;
  timeZone: string;
  /** An administrator who must set up a second factor before using administrator routes. */
  mustEnrolSecondFactor: boolean;
}

export interface JwtPayload {
  sub: string;
  ver: number;
}
