import type { TermsStatus } from '@broodsilk/shared';
import type { TermsVersion } from './terms-version.entity';

export interface VersionAcceptanceFacts {
  number: number;
  /** Member ids of the partner-role parties listed in the version: each must accept. */
  mustAccept: readonly string[];
  accepted: readonly string[];
}

/** What the rule reads of a version loaded with its lines' members and its acceptances. */
export function acceptanceFacts(v: TermsVersion): VersionAcceptanceFacts {
  return {
    number: v.number,
    mustAccept: v.lines
      .getItems()
      .filter((l) => l.member.role === 'partner')
      .map((l) => l.member.id),
    accepted: v.acceptances.getItems().map((a) => a.member.id),
  };
}

/**
 * In force: the latest version every partner party accepted. Newer versions still awaiting
 * acceptance are `proposed`; all others (older, or accepted but overtaken) are `superseded`.
 */
export function termsStatuses(versions: readonly VersionAcceptanceFacts[]): { inForce: number | null; status: Map<number, TermsStatus> } {
  const fullyAccepted = (v: VersionAcceptanceFacts) => v.mustAccept.every((m) => v.accepted.includes(m));
  const inForce = versions.filter(fullyAccepted).reduce<number | null>((max, v) => (max === null || v.number > max ? v.number : max), null);
  const status = new Map<number, TermsStatus>();
  for (const v of versions) {
    status.set(
      v.number,
      v.number === inForce ? 'in-force' : inForce !== null && v.number < inForce ? 'superseded' : fullyAccepted(v) ? 'superseded' : 'proposed',
    );
  }
  return { inForce, status };
}
