import type { HandOverTodo, PaymentTodo } from '@broodsilk/shared';
import { handOversAwaitingArrival, type AccountView } from './account-view';

/** What the viewer must do in one project's account: confirm hand-overs they received, pay or be paid. */
export function accountTodos(view: AccountView, userId: string): { handOvers: HandOverTodo[]; payments: PaymentTodo[] } {
  const project = { projectId: view.data.project.id, projectTitle: view.data.project.title };
  const isOwner = view.owner.user?.id === userId;
  const awaiting = handOversAwaitingArrival(view);
  const handOvers = view.data.rows
    .filter((r) => awaiting.has(r.id) && (r.party!.user ? r.party!.user.id === userId : isOwner))
    .map((r) => ({ ...project, entryId: r.id, date: r.date, count: r.count!, partyName: view.nameOf(r.party!.id), mine: r.party!.user?.id === userId }));
  const userOf = new Map(view.data.members.map((m) => [m.id, m.user?.id ?? null]));
  const payments = view.balances.debts.flatMap((d): PaymentTodo[] => {
    const base = { ...project, amountMinor: d.amountMinor, currency: d.currency };
    if (userOf.get(d.fromPartyId) === userId) return [{ ...base, direction: 'owed-by-me', otherName: view.nameOf(d.toPartyId) }];
    if (userOf.get(d.toPartyId) === userId) return [{ ...base, direction: 'owed-to-me', otherName: view.nameOf(d.fromPartyId) }];
    return [];
  });
  return { handOvers, payments };
}
