/**
 * The longest text each field accepts, in characters. The client shows these beside its fields
 * before the server refuses; the server's DTOs take their @MaxLength from here, so both sides hold one number.
 */
export const TEXT_LIMITS = Object.freeze({
  /** A keyset page's cursor (`after`), as the server handed it out; not typed by a person. */
  pageCursor: 200,
  /** An animal's label or enclosure. */
  animalLabel: 60,
  enclosure: 60,
  acquiredFrom: 200,
  email: 200,
  personName: 120,
  animalNotes: 4000,
  premoltNote: 500,
  /** Notes on a molt, sac, opening, pairing, brood count or care-log entry; notes to partners. */
  note: 2000,
  projectTitle: 120,
  projectNotes: 5000,
  correctionReason: 500,
  /** Why an unusual entry (a plausibility warning) is right. */
  warningReason: 500,
  /** What an animal was fed. */
  prey: 200,
  ledgerNote: 1000,
  carrier: 100,
  tracking: 100,
  displayName: 80,
  password: 200,
  /** Six digits from an authenticator app, or a recovery code with its dashes. */
  secondFactorCode: 40,
  /** The keeper's own words sent to the partners with bad news (a failed sac, a project ended early). */
  partnerMessage: 1000,
});

export type TextLimitName = keyof typeof TEXT_LIMITS;
