import { useMutation } from '@tanstack/react-query';
import type { PasswordResetConfirmRequest, PasswordResetRequest } from '@broodsilk/shared';
import { api } from '@/lib/api-client';

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (body: PasswordResetRequest) => api.post<{ message: string }>('/auth/password-reset', body),
    meta: { handlesErrors: true },
  });
}

export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: (body: PasswordResetConfirmRequest) => api.post<void>('/auth/password-reset/confirm', body),
    meta: { handlesErrors: true },
  });
}
