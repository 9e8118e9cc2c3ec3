import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginRequest, LoginResponse, RegisterRequest } from '@broodsilk/shared';
import { api, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './me';

function useSessionMutation<T>(path: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: T) => api.post<LoginResponse>(path, body),
    meta: { handlesErrors: true },
    onSuccess: async (res) => {
      setCsrfToken(res.csrfToken);
      qc.clear();
      qc.setQueryData(authKeys.me, res.user);
    },
  });
}

export const useLogin = () => useSessionMutation<LoginRequest>('/auth/login');
export const useRegister = () => useSessionMutation<RegisterRequest>('/auth/register');

export function useLogout() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/auth/logout'),
    onSettled: () => {
      setCsrfToken(null);
      qc.clear();
      qc.setQueryData(authKeys.me, null);
    },
  });
}
