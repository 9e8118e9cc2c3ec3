/** Every query of one project's account sits under ['account', projectId], so one invalidation refreshes them all. */
export const accountKeys = {
  project: (projectId: string) => ['account', projectId] as const,
  shares: (projectId: string) => ['account', projectId, 'shares'] as const,
  entries: (projectId: string) => ['account', projectId, 'entries'] as const,
  handOverForm: (projectId: string) => ['account', projectId, 'entries', 'hand-over-form'] as const,
  balances: (projectId: string) => ['account', projectId, 'balances'] as const,
  statement: (projectId: string, memberId: string) => ['account', projectId, 'statement', memberId] as const,
  /** The signed-in keeper's payout account (not tied to one project). */
  payoutAccount: () => ['account', 'payout-account'] as const,
};
