import type { HandOverTodo, PaymentTodo } from '@broodsilk/shared';
import { handOversAwaitingArrival, type AccountView, type LedgerRowFacts } from './account-view';

/** What the viewer must do in one project's account: confirm hand-overs they received, pay or be paid. */
export function accountTodos(view: AccountView<LedgerRowFacts>, userId: string): { handOvers: HandOverTodo[]; payments: PaymentTodo[] } {
  const project = { projectId: view.data.project.id, projectTitle: view.data.project.title };
  const isOwner = view.owner.user?.id === userId;
  const awaiting = handOversAwaitingArrival(view);
  const userOf = (memberId: string) => view.memberOf(memberId)?.user?.id;
  const recipientUser = (r: LedgerRowFacts) => userOf(r.party!.id);
  const handOvers = view.data.rows
    .filter((r) => awaiting.has(r.id) && (recipientUser(r) ? recipientUser(r) === userId : isOwner))
    .map((r) => ({ ...project, entryId: r.id, date: r.date, count: r.count!, partyName: view.nameOf(r.party!.id), mine: recipientUser(r) === userId }));
  const payments = view.balances.debts.flatMap((d): PaymentTodo[] => {
    const base = { ...project, amountMinor: d.amountMinor, currency: d.currency };
    if (userOf(d.fromPartyId) === userId) return [{ ...base, direction: 'owed-by-me', otherName: view.nameOf(d.toPartyId) }];
    if (userOf(d.toPartyId) === userId) return [{ ...base, direction: 'owed-to-me', otherName: view.nameOf(d.fromPartyId) }];
    return [];
  });
  return { handOvers, payments };
}
