import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChangePasswordRequest, LoginResponse, Me, UpdateProfileRequest } from '@broodsilk/shared';
import { api, setCsrfToken } from '@/lib/api-client';
import { meQueryKey } from '@/lib/query-keys';

export function useUpdateProfile() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateProfileRequest) => api.patch<Me>('/users/me', body),
    meta: { handlesErrors: true },
    onSuccess: async (me) => {
      qc.setQueryData(meQueryKey, me);
      await qc.invalidateQueries();
    },
  });
}

export function useChangePassword() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: ChangePasswordRequest) => api.patch<LoginResponse>('/auth/password', body),
    meta: { handlesErrors: true },
    onSuccess: (res) => {
      setCsrfToken(res.csrfToken);
      qc.setQueryData(meQueryKey, res.user);
    },
  });
}
