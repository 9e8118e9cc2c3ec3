import { formatMoneyCode as money } from '@broodsilk/shared';
import type { AccountView } from './account-view';
import type { LedgerEntryRow } from './ledger-entry.entity';

/** One sentence for the timeline and the statement. */
export function describeEntry(view: AccountView, r: LedgerEntryRow): string {
  const n = (id: string | undefined) => (id ? view.nameOf(id) : 'someone');
  switch (r.kind) {
    case 'hand-over':
      return `${r.count} young handed over to ${n(r.party?.id)} (${r.method === 'shipment' ? `shipped with ${r.carrier}, tracking ${r.tracking}` : 'picked up'}).`;
    case 'arrival':
      return `${n(r.party?.id)} confirmed the hand-over: ${r.arrivedAlive} arrived alive, ${r.arrivedDead} dead.`;
    case 'sale':
      return `${r.count} young of ${n(r.party?.id)}'s share sold for ${money(r.priceMinor!, r.currency!)}.`;
    case 'cash-out':
      return `${n(r.party?.id)} cashed out ${r.count} young.`;
    case 'money':
      return `${n(r.fromParty?.id)} paid ${n(r.toParty?.id)} ${money(r.amountMinor!, r.currency!)}${r.source === 'payment-provider' ? ' through the payment provider' : ''}.`;
    case 'correction':
      return `An entry was reversed: ${r.reason}.`;
    case 'confirmation':
      return `${n(r.party?.id)} confirmed receiving a payment.`;
  }
}
