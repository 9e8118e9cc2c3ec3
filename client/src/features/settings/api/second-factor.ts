import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type {
  RecoveryCodesRenewalRequest,
  RecoveryCodesResponse,
  SecondFactorRemovalRequest,
  SecondFactorStatus,
  TotpConfirmRequest,
  TotpEnrolment,
} from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { queryRoots } from '@/lib/query-keys';

export const secondFactorQuery = () =>
  queryOptions({ queryKey: [...queryRoots.auth, 'second-factor'] as const, queryFn: () => api.get<SecondFactorStatus>('/auth/second-factor') });

export const useSecondFactorStatus = () => useQuery(secondFactorQuery());

/** A new secret for the app; nothing changes on the account until a code from it is confirmed. */
export const useStartEnrolment = () =>
  useMutation({ mutationFn: () => api.post<TotpEnrolment>('/auth/second-factor/enrolment'), meta: { handlesErrors: true } });

/** Both change what `me` says about the second factor. */
export const useConfirmEnrolment = () =>
  useMutation({
    mutationFn: (body: TotpConfirmRequest) => api.post<RecoveryCodesResponse>('/auth/second-factor/enrolment/confirm', body),
    meta: { handlesErrors: true, invalidates: [queryRoots.auth] },
  });

export const useRemoveSecondFactor = () =>
  useMutation({
    mutationFn: (body: SecondFactorRemovalRequest) => api.post<void>('/auth/second-factor/removal', body),
    meta: { handlesErrors: true, invalidates: [queryRoots.auth] },
  });

/** New recovery codes, shown once; the count left in the status changes. */
export const useRenewRecoveryCodes = () =>
  useMutation({
    mutationFn: (body: RecoveryCodesRenewalRequest) => api.post<RecoveryCodesResponse>('/auth/second-factor/recovery-codes', body),
    meta: { handlesErrors: true, invalidates: [queryRoots.auth] },
  });
