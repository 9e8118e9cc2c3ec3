import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChangePasswordRequest, LoginResponse, Me, UpdateProfileRequest } from '@broodsilk/shared';
import { api, setCsrfToken } from '@/lib/api-client';

// The "me" key belongs to auth; settings only writes through it.
const meKey = ['auth', 'me'] as const;

export function useUpdateProfile() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateProfileRequest) => api.patch<Me>('/users/me', body),
    meta: { handlesErrors: true },
    onSuccess: async (me) => {
      qc.setQueryData(meKey, me);
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
      qc.setQueryData(meKey, res.user);
    },
  });
}
