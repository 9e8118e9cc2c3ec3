import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  needsSecondFactor,
  type LoginRequest,
  type LoginResponse,
  type RegisterRequest,
  type SecondFactorSignInRequest,
  type SignInResult,
} from '@broodsilk/shared';
import { api, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './me';

function useSessionMutation<T, R extends SignInResult = LoginResponse>(path: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: T) => api.post<R>(path, body),
    meta: { handlesErrors: true },
    onSuccess: async (res) => {
      // A right password on an account with a second factor starts no session yet.
      if (needsSecondFactor(res)) return;
      setCsrfToken(res.csrfToken);
      qc.clear();
      qc.setQueryData(authKeys.me, res.user);
    },
  });
}

export const useLogin = () => useSessionMutation<LoginRequest, SignInResult>('/auth/login');
export const useSecondFactorSignIn = () => useSessionMutation<SecondFactorSignInRequest>('/auth/login/second-factor');
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
