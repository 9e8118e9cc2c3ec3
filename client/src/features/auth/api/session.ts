import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  needsSecondFactor,
  type EmailConfirmationRequest,
  type EmailConfirmationResendRequest,
  type EmailConfirmationResult,
  type LoginRequest,
  type LoginResponse,
  type RegisterRequest,
  type RegisterResponse,
  type SecondFactorSignInRequest,
  type SignInResult,
} from '@broodsilk/shared';
import { api, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './me';

/** `session` picks the session out of the answer: none when a second factor or a confirmation comes first. */
function useSessionMutation<T, R>(path: string, session: (res: R) => LoginResponse | null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: T) => api.post<R>(path, body),
    meta: { handlesErrors: true },
    onSuccess: async (res) => {
      const started = session(res);
      if (!started) return;
      setCsrfToken(started.csrfToken);
      qc.clear();
      qc.setQueryData(authKeys.me, started.user);
    },
  });
}

// A right password on an account with a second factor starts no session yet.
export const useLogin = () => useSessionMutation<LoginRequest, SignInResult>('/auth/login', (res) => (needsSecondFactor(res) ? null : res));
export const useSecondFactorSignIn = () => useSessionMutation<SecondFactorSignInRequest, LoginResponse>('/auth/login/second-factor', (res) => res);
/** Opens the e-mailed link: confirms the address and starts a session unless the account has a second factor. */
export const useConfirmEmail = () => useSessionMutation<EmailConfirmationRequest, EmailConfirmationResult>('/auth/confirm-email', (res) => res.session);

/** Registration answers the same for every address and signs nobody in; the e-mail has the next step. */
export const useRegister = () =>
  useMutation({ mutationFn: (body: RegisterRequest) => api.post<RegisterResponse>('/auth/register', body), meta: { handlesErrors: true } });

export const useResendConfirmation = () =>
  useMutation({
    mutationFn: (body: EmailConfirmationResendRequest) => api.post<{ message: string }>('/auth/confirm-email/resend', body),
    meta: { handlesErrors: true },
  });

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
