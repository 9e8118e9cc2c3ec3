import { BadRequestException, ConflictException, ForbiddenException, NotFoundException } from '@nestjs/common';
import { checkWithdrawal, type CreateEntryRequest } from '@broodsilk/shared';
import type { ProjectMember } from '../projects/project-member.entity';
import type { ProjectAccess } from '../projects/project-access.service';
import type { AccountView, SacShareState } from './account-view';
import type { LedgerEntryRow, LedgerRowValues } from './ledger-entry.entity';
import { fieldRefusal, refusal, type Refusal } from '../common/refusal';

/** The checked parts of a new row; EntriesService turns them into an entity. */
export type EntryDraft = Partial<LedgerRowValues> & {
  kind: LedgerEntryRow['kind'];
  date: string;
  party?: ProjectMember;
  fromParty?: ProjectMember;
  toParty?: ProjectMember;
  target?: LedgerEntryRow;
};

const need = (value: unknown, why: Refusal): void => {
  if (value === undefined || value === null) throw new BadRequestException(why);
};

function partyOf(view: AccountView, id: string | undefined, field: string): ProjectMember {
  need(id, refusal('account.partyNeeded', { field }));
  const m = view.data.members.find((x) => x.id === id);
  if (!m) throw new BadRequestException(refusal('account.notParty', { field }));
  if (m.role === 'caretaker') throw new BadRequestException(refusal('account.caretakerNoShare', { name: view.nameOf(m.id) }));
  return m;
}

function sacFor(view: AccountView, dto: CreateEntryRequest): SacShareState {
  if (dto.sacId) {
    const s = view.sacs.find((x) => x.fact.sacId === dto.sacId);
    if (!s) throw new BadRequestException(refusal('account.notSac'));
    return s;
  }
  const withYoung = view.sacs.filter((s) => s.aliveInCare > 0);
  if (withYoung.length === 1) return withYoung[0]!;
  if (withYoung.length === 0) throw new ConflictException(refusal('account.noYoungInCare'));
  throw new BadRequestException(refusal('account.whichSac'));
}

/** Young out of a share: fits the sac's live count and what the party is still owed (409 saying by how much). */
function withdrawal(view: AccountView, dto: CreateEntryRequest, party: ProjectMember): Pick<EntryDraft, 'sacId' | 'count'> {
  need(dto.count, refusal('account.countNeeded'));
  const sac = sacFor(view, dto);
  const count = dto.count!;
  if (count > sac.aliveInCare) {
    throw new ConflictException(refusal('account.moreThanAlive', { alive: sac.aliveInCare, over: count - sac.aliveInCare }));
  }
  const balance = view.balances.parties.find((p) => p.partyId === party.id);
  if (!balance || !view.data.terms?.lines.getItems().some((l) => l.member.id === party.id)) {
    throw new ConflictException(refusal('account.noShare', { name: view.nameOf(party.id) }));
  }
  const check = checkWithdrawal(balance, count);
  if (check.message) throw new ConflictException(refusal('account.withdrawalExcess', { name: view.nameOf(party.id), ...check.values }));
  return { sacId: sac.fact.sacId, count };
}

function currencyOf(view: AccountView, given: string | undefined): string {
  const currency = view.data.terms!.currency;
  if (given && given !== currency) throw new BadRequestException(refusal('account.otherCurrency', { currency, given }));
  return currency;
}

/** Who may record what: the owner everything; a partner only payments they are part of, and corrections of their own entries. */
function assertMayRecord(view: AccountView, access: ProjectAccess, userId: string, dto: CreateEntryRequest): void {
  if (access.role === 'owner') return;
  const me = access.member.id;
  if (dto.kind === 'money' && (dto.fromMemberId === me || dto.toMemberId === me)) return;
  if (dto.kind === 'correction') {
    const target = view.data.rows.find((r) => r.id === dto.reversesId);
    if (target && target.recordedBy?.id === userId) return;
    throw new ForbiddenException(refusal('account.partnerOwnCorrections'));
  }
  if (dto.kind === 'money') throw new ForbiddenException(refusal('account.partnerOwnPayments'));
  throw new ForbiddenException(refusal('account.ownerRecords'));
}

/** An entry records what has happened: its date is the recorder's today or earlier. */
export function assertNotFutureDate(date: string, today: string, what: CreateEntryRequest['kind'] | 'confirmation'): void {
  if (date > today)
    throw new BadRequestException({
      ...refusal(`account.futureDate.${what}`, { date, today }),
      details: [fieldRefusal('date', 'account.futureDateField', { date })],
    });
}

export function draftEntry(view: AccountView, access: ProjectAccess, userId: string, dto: CreateEntryRequest, today: string): EntryDraft {
  assertMayRecord(view, access, userId, dto);
  assertNotFutureDate(dto.date, today, dto.kind);
  const base = { kind: dto.kind, date: dto.date, note: dto.note ?? null };
  if (dto.kind !== 'correction' && !view.data.terms) {
    throw new ConflictException(refusal('account.noTermsInForce'));
  }
  switch (dto.kind) {
    case 'hand-over': {
      need(dto.method, refusal('account.methodNeeded'));
      if (dto.method === 'shipment' && (!dto.carrier || !dto.tracking)) throw new BadRequestException(refusal('account.shipmentNeeds'));
      if (dto.method === 'pick-up' && (dto.carrier || dto.tracking)) throw new BadRequestException(refusal('account.pickUpNoCarrier'));
      const party = partyOf(view, dto.memberId, 'memberId');
      return { ...base, party, method: dto.method, carrier: dto.carrier ?? null, tracking: dto.tracking ?? null, ...withdrawal(view, dto, party) };
    }
    case 'sale': {
      need(dto.priceMinor, refusal('account.priceNeeded'));
      const party = partyOf(view, dto.memberId, 'memberId');
      return { ...base, party, priceMinor: dto.priceMinor, currency: currencyOf(view, dto.currency), ...withdrawal(view, dto, party) };
    }
    case 'cash-out': {
      const party = partyOf(view, dto.memberId, 'memberId');
      if (party.id === view.owner.id) throw new BadRequestException(refusal('account.ownerNoCashOut'));
      const out = withdrawal(view, dto, party);
      const sac = view.sacs.find((s) => s.fact.sacId === out.sacId)!;
      if (sac.fact.estimated) throw new ConflictException(refusal('account.exactCountNeeded', { layDate: sac.fact.layDate, alive: sac.fact.aliveAtCount }));
      return { ...base, party, pricePerSpiderlingMinor: dto.pricePerSpiderlingMinor ?? null, ...out };
    }
    case 'money': {
      need(dto.amountMinor, refusal('account.amountNeeded'));
      const fromParty = partyOf(view, dto.fromMemberId, 'fromMemberId');
      const toParty = partyOf(view, dto.toMemberId, 'toMemberId');
      if (fromParty.id === toParty.id) throw new BadRequestException(refusal('account.paymentSameParty'));
      return { ...base, fromParty, toParty, amountMinor: dto.amountMinor, currency: currencyOf(view, dto.currency) };
    }
    case 'correction': {
      need(dto.reversesId, refusal('account.reversesNeeded'));
      need(dto.reason, refusal('account.reasonNeeded'));
      const target = view.data.rows.find((r) => r.id === dto.reversesId);
      if (!target) throw new NotFoundException(refusal('account.noSuchEntry'));
      if (target.kind === 'confirmation') throw new BadRequestException(refusal('account.confirmationAlone'));
      const inForce = new Set(view.balances.inForce);
      const already = view.data.rows.find((r) => r.kind === 'correction' && r.target?.id === target.id && (inForce.has(r.id) || view.pending.has(target.id)));
      if (already) throw new ConflictException(refusal('account.alreadyReversed'));
      assertReinstatementFits(view, target);
      return { ...base, target, reason: dto.reason };
    }
  }
}

/** Reversing a correction brings its target back; a hand-over, sale or cash-out coming back must still fit the share. */
function assertReinstatementFits(view: AccountView, correction: LedgerEntryRow): void {
  const back = correction.kind === 'correction' ? correction.target : null;
  if (back) assertWithdrawalFits(view, back, 'reinstateExcess');
}

const WITHDRAWALS = ['hand-over', 'sale', 'cash-out'] as const;
const isWithdrawal = (kind: string): kind is (typeof WITHDRAWALS)[number] => (WITHDRAWALS as readonly string[]).includes(kind);

/** A withdrawal that starts to count (reinstated, or accepted by its party) must still fit the party's share. */
export function assertWithdrawalFits(view: AccountView, row: LedgerEntryRow, lead: 'reinstateExcess' | 'noLongerFits' = 'noLongerFits'): void {
  if (!isWithdrawal(row.kind) || !row.party) return;
  const balance = view.balances.parties.find((p) => p.partyId === row.party!.id);
  if (!balance) return;
  const check = checkWithdrawal(balance, row.count!);
  if (check.message) throw new ConflictException(refusal(`account.${lead}.${row.kind}`, { name: view.nameOf(row.party.id), ...check.values }));
}
