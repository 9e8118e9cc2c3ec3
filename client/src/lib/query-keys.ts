import type { QueryKey } from '@tanstack/react-query';

/**
 * The root key of each cached area. Features build their keys under these, and a mutation that
 * changes another feature's data names that feature's root in `meta.invalidates`, so no feature
 * spells another's keys.
 */
export const queryRoots = {
  auth: ['auth'],
  animals: ['animals'],
  species: ['species'],
  projects: ['projects'],
  sacs: ['sacs'],
  account: ['account'],
  dashboard: ['dashboard'],
  calendar: ['calendar'],
  invitations: ['invitations'],
  reminders: ['reminders'],
  notifications: ['notifications'],
  progress: ['progress'],
} as const satisfies Record<string, QueryKey>;

/** The signed-in user: auth reads it, settings and the 401 handler write it. */
export const meQueryKey = [...queryRoots.auth, 'me'] as const;
