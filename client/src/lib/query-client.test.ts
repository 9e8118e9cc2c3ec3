import { describe, expect, it } from 'vitest';
import { createQueryClient } from './query-client';
import { queryRoots } from './query-keys';

/** Runs one mutation through the client's mutation cache, as useMutation would. */
function mutate(qc: ReturnType<typeof createQueryClient>, options: { fail?: boolean; invalidates?: readonly (readonly unknown[])[] }) {
  const mutation = qc.getMutationCache().build(qc, {
    mutationFn: async () => {
      if (options.fail) throw new Error('refused');
      return 'ok';
    },
    meta: { handlesErrors: true, invalidates: options.invalidates },
  });
  return mutation.execute(undefined);
}

describe('invalidation through mutation meta', () => {
  it('marks every query under the named roots stale after success, and nothing else', async () => {
    const qc = createQueryClient();
    for (const key of [
      [...queryRoots.projects, 'list'],
      [...queryRoots.projects, 'detail', 'p1'],
      [...queryRoots.dashboard, 'today'],
      [...queryRoots.animals, 'list'],
    ])
      await qc.fetchQuery({ queryKey: key, queryFn: () => 'cached' });

    await mutate(qc, { invalidates: [queryRoots.projects, queryRoots.dashboard] });

    const invalidated = (key: readonly unknown[]) => qc.getQueryState(key)?.isInvalidated;
    expect(invalidated([...queryRoots.projects, 'list'])).toBe(true);
    expect(invalidated([...queryRoots.projects, 'detail', 'p1'])).toBe(true);
    expect(invalidated([...queryRoots.dashboard, 'today'])).toBe(true);
    expect(invalidated([...queryRoots.animals, 'list'])).toBe(false);
  });

  it('leaves the cache alone when the mutation fails', async () => {
    const qc = createQueryClient();
    await qc.fetchQuery({ queryKey: [...queryRoots.projects, 'list'], queryFn: () => 'cached' });
    await expect(mutate(qc, { fail: true, invalidates: [queryRoots.projects] })).rejects.toThrow('refused');
    expect(qc.getQueryState([...queryRoots.projects, 'list'])?.isInvalidated).toBe(false);
  });
});
