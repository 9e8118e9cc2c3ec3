import { formatFraction, type TermsStatus, type TermsVersionResponse } from '@broodsilk/shared';
import type { TermsVersion } from './terms-version.entity';

const nameOf = (m: { user?: { displayName: string } | null; name: string }) => m.user?.displayName ?? m.name;

/** Needs `createdBy`, `lines.member.user`, `acceptances.member.user`, `acceptances.recordedBy` loaded. */
export function toTermsVersionResponse(v: TermsVersion, status: TermsStatus): TermsVersionResponse {
  const lines = [...v.lines].sort((a, b) => a.pickOrder - b.pickOrder);
  const weightTotal = BigInt(lines.reduce((s, l) => s + l.weight, 0));
  const acceptedIds = new Set([...v.acceptances].map((a) => a.member.id));
  const mustAccept = (role: string) => role === 'partner';
  return {
    number: v.number,
    status,
    createdAt: v.createdAt.toISOString(),
    createdBy: { id: v.createdBy.id, name: v.createdBy.displayName },
    pricePerSpiderlingMinor: v.pricePerSpiderlingMinor,
    currency: v.currency,
    failureClause: v.failureClause,
    handOverStage: v.handOverStage,
    shippingPaidBy: v.shippingPaidBy,
    note: v.note ?? null,
    lines: lines.map((l) => ({
      memberId: l.member.id,
      memberName: nameOf(l.member),
      role: l.member.role === 'owner' ? 'owner' : 'partner',
      weight: l.weight,
      fixedCount: l.fixedCount,
      pickOrder: l.pickOrder,
      share: formatFraction(BigInt(l.weight), weightTotal),
      mustAccept: mustAccept(l.member.role),
      accepted: acceptedIds.has(l.member.id),
    })),
    acceptances: [...v.acceptances]
      .sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())
      .map((a) => ({
        memberId: a.member.id,
        memberName: nameOf(a.member),
        acceptedAt: a.createdAt.toISOString(),
        recordedBy: { id: a.recordedBy.id, name: a.recordedBy.displayName },
        onBehalf: a.onBehalf,
        note: a.note ?? null,
      })),
    awaiting:
      status === 'proposed'
        ? lines.filter((l) => mustAccept(l.member.role) && !acceptedIds.has(l.member.id)).map((l) => ({ memberId: l.member.id, name: nameOf(l.member) }))
        : [],
  };
}
