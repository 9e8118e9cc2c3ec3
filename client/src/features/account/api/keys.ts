import { queryRoots } from '@/lib/query-keys';

/** Every query of one project's account sits under ['account', projectId], so one invalidation refreshes them all. */
export const accountKeys = {
  project: (projectId: string) => [...queryRoots.account, projectId] as const,
  shares: (projectId: string) => [...accountKeys.project(projectId), 'shares'] as const,
  entries: (projectId: string) => [...accountKeys.project(projectId), 'entries'] as const,
  handOverForm: (projectId: string) => [...accountKeys.entries(projectId), 'hand-over-form'] as const,
  balances: (projectId: string) => [...accountKeys.project(projectId), 'balances'] as const,
  statement: (projectId: string, memberId: string) => [...accountKeys.project(projectId), 'statement', memberId] as const,
  /** The signed-in keeper's payout account (not tied to one project). */
  payoutAccount: () => [...queryRoots.account, 'payout-account'] as const,
};
