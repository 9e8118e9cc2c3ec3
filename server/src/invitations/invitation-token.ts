import { hashLinkToken, newLinkToken } from '../common/link-token';

/** Seven days to accept; after that the owner sends a new one. */
export const INVITATION_DAYS = 7;

/** 32 random bytes, URL-safe; only its SHA-256 is stored, so a database leak opens no project. */
export const newInvitationToken = newLinkToken;
export const hashInvitationToken = hashLinkToken;
