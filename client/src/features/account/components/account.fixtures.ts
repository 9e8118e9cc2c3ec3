import {
  wordsFor,
  type BalancesResponse,
  type HandOverFormResponse,
  type LedgerEntryResponse,
  type PartyBalanceView,
  type SharesResponse,
} from '@broodsilk/shared';

/** Test data shaped like the server's answers. */
export const MIRA = { memberId: '11111111-1111-4111-8111-111111111111', name: 'Mira' };
export const TOMASZ = { memberId: '22222222-2222-4222-8222-222222222222', name: 'Tomasz' };
export const PROJECT_ID = '33333333-3333-4333-8333-333333333333';

export function party(ref: { memberId: string; name: string }, over: Partial<PartyBalanceView> = {}): PartyBalanceView {
  return {
    ...ref,
    partyId: ref.memberId,
    share: 0,
    handedOver: 0,
    sold: 0,
    cashedOut: 0,
    owedSpiderlings: 0,
    arrivedAlive: 0,
    arrivedDead: 0,
    unconfirmedHandOvers: 0,
    salesMinor: 0,
    cashOutValueMinor: 0,
    paidMinor: 0,
    receivedMinor: 0,
    moneyOwedToMinor: 0,
    moneyOwesMinor: 0,
    ...over,
  };
}

export function balances(over: Partial<BalancesResponse> = {}): BalancesResponse {
  return {
    projectId: PROJECT_ID,
    currency: 'EUR',
    ownerMemberId: MIRA.memberId,
    parties: [party(MIRA, { share: 12, owedSpiderlings: 12 }), party(TOMASZ, { share: 8, handedOver: 3, owedSpiderlings: 5, moneyOwesMinor: 1200 })],
    debts: [{ fromPartyId: TOMASZ.memberId, toPartyId: MIRA.memberId, amountMinor: 1200, currency: 'EUR', fromName: 'Tomasz', toName: 'Mira' }],
    problems: [],
    settled: false,
    provisional: false,
    ...over,
  };
}

export function shares(): SharesResponse {
  return {
    projectId: PROJECT_ID,
    terms: {
      number: 1,
      pricePerSpiderlingMinor: 400,
      currency: 'EUR',
      failureClause: 'nothing-owed',
      handOverStage: 'second instar',
      shippingPaidBy: 'the recipient',
      lines: [],
    },
    sacs: [
      {
        sacId: '44444444-4444-4444-8444-444444444444',
        layDate: '2026-09-01',
        outcome: 'emerged',
        count: 20,
        aliveInCare: 17,
        estimated: false,
        withdrawn: 3,
        parties: [
          { ...MIRA, count: 12, fixed: 0, proportional: 12, exactQuota: '12', roundedUp: false },
          { ...TOMASZ, count: 8, fixed: 0, proportional: 8, exactQuota: '8', roundedUp: false },
        ],
        explanation: ['20 young are shared 3 : 2.'],
        change: null,
        failure: null,
      },
    ],
    totals: [
      { ...MIRA, count: 12 },
      { ...TOMASZ, count: 8 },
    ],
    notices: [],
  };
}

export function entry(over: Partial<LedgerEntryResponse>): LedgerEntryResponse {
  return {
    id: '55555555-5555-4555-8555-555555555555',
    seq: 1,
    kind: 'hand-over',
    date: '2026-11-20',
    sacId: null,
    party: TOMASZ,
    from: null,
    to: null,
    count: 3,
    method: 'pick-up',
    carrier: null,
    tracking: null,
    priceMinor: null,
    pricePerSpiderlingMinor: null,
    amountMinor: null,
    currency: null,
    handOverId: null,
    arrivedAlive: null,
    arrivedDead: null,
    reversesId: null,
    confirmsId: null,
    reason: null,
    note: null,
    source: 'manual',
    recordedBy: { id: 'u1', name: 'Mira' },
    recordedAt: '2026-11-20T10:00:00.000Z',
    status: 'in-force',
    problem: null,
    awaitingConfirmationBy: TOMASZ,
    ...over,
  };
}

/** Two of the catalogue's shipping cautions (docs/trade-facts.md §9), as an English reader sees them. */
export const CAUTION_OVERNIGHT = wordsFor('en')('safety.shipping.overnight');
export const CAUTION_LAW = wordsFor('en')('safety.shipping.general');

export function handOverForm(): HandOverFormResponse {
  return {
    parties: [
      { ...MIRA, owedSpiderlings: 12 },
      { ...TOMASZ, owedSpiderlings: 5 },
    ],
    methods: ['pick-up', 'shipment'],
    handOverStage: 'second-instar',
    shippingPaidBy: 'recipient',
  };
}
