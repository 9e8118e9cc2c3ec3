import { useQuery } from '@tanstack/react-query';

// The query function reads `id` but the key leaves it out: @tanstack/query/exhaustive-deps must flag it.
export function useThing(id: string) {
  return useQuery({ queryKey: ['thing'], queryFn: () => fetch(`/api/things/${id}`) });
}
