import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { CheckoutResponse, CreateCheckoutRequest, CreatePayoutAccountRequest, PayoutAccountResponse } from '@broodsilk/shared';
import { api } from '@/lib/api-client';
import { accountKeys } from './keys';

export function fetchPayoutAccount(signal?: AbortSignal): Promise<PayoutAccountResponse> {
  return api.get<PayoutAccountResponse>('/settlements/payout-account', { signal });
}

export const payoutQueries = {
  account: () =>
    queryOptions({
      queryKey: accountKeys.payoutAccount(),
      queryFn: ({ signal }) => fetchPayoutAccount(signal),
    }),
};

export function usePayoutAccount(enabled = true) {
  return useQuery({ ...payoutQueries.account(), enabled });
}

/** Links (or re-links) a payout account; the answer carries the onboarding link. */
export function useCreatePayoutAccount() {
  return useMutation({
    mutationFn: (body: CreatePayoutAccountRequest) => api.post<PayoutAccountResponse>('/settlements/payout-account', body),
    meta: { handlesErrors: true, invalidates: [accountKeys.payoutAccount()] },
  });
}

/** Starts a payment to another party; the browser is then sent to the payment page at `url`. */
export function useCreateCheckout(projectId: string) {
  return useMutation({
    mutationFn: (body: CreateCheckoutRequest) => api.post<CheckoutResponse>(`/projects/${projectId}/settlements/checkout`, body),
    meta: { handlesErrors: true, invalidates: [accountKeys.project(projectId)] },
  });
}
