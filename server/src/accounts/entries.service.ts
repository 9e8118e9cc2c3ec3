import { BadRequestException, ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import { todayIn, type ConfirmEntryRequest, type CreateEntryRequest, type KeysetPage, type KeysetQuery, type LedgerEntryResponse } from '@broodsilk/shared';
import { decodeCursor, encodeCursor, pageSize } from '../common/paging/keyset-cursor';
import type { AuthUser } from '../common/auth-user';
import { ActivityService } from '../activity/activity.service';
import type { ProjectAccess } from '../projects/project-access.service';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';
import { AccountLock } from './account-lock';
import { loadAccount } from './account-loader';
import { acceptorOf, type AccountView } from './account-view';
import { toEntryResponses } from './accounts.mapper';
import { assertNotFutureDate, assertWithdrawalFits, draftEntry, type EntryDraft } from './entry-rules';
import { LedgerEntryRow } from './ledger-entry.entity';
import { describeEntry } from './entry-words';
import { Clock } from '../common/clock';
import { refusal } from '../common/refusal';

@Injectable()
export class EntriesService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly lock: AccountLock,
    private readonly activity: ActivityService,
  ) {}

  /**
   * The ledger in its order (seq), one page at a time by keyset: the page after a cursor holds the
   * entries recorded after the cursor's entry. Each entry's state (in force, reversed, awaiting)
   * depends on the whole account, so the account is loaded whole (a fixed number of statements);
   * the page bounds what is sent.
   */
  async list(access: ProjectAccess, page: KeysetQuery = {}): Promise<KeysetPage<LedgerEntryResponse>> {
    const view = await loadAccount(this.em, access.project);
    const rows = view.data.rows;
    let start = 0;
    if (page.after) {
      const seq = decodeCursor(page.after, 'seq', 'integer');
      const at = rows.findIndex((r) => r.seq === seq);
      if (at < 0) throw new BadRequestException(refusal('account.cursorNotInAccount'));
      start = at + 1;
    }
    const end = start + pageSize(page);
    const items = toEntryResponses(view).slice(start, end);
    return { items, nextCursor: end < rows.length ? encodeCursor({ seq: rows[end - 1].seq }) : null };
  }

  /** Checks and appends one entry under the account lock, with its activity record, in one transaction. */
  async create(access: ProjectAccess, user: AuthUser, dto: CreateEntryRequest): Promise<LedgerEntryResponse> {
    return this.write(access, async (tx, view) => draftEntry(view, access, user.id, dto, todayIn(user.timeZone, this.clock.now())), user);
  }

  /** The recipient confirms a hand-over (arrival counts) or the payee confirms a payment. */
  async confirm(access: ProjectAccess, user: AuthUser, entryId: string, dto: ConfirmEntryRequest): Promise<LedgerEntryResponse> {
    return this.write(access, async (_tx, view) => confirmationDraft(view, access, user.id, entryId, dto, todayIn(user.timeZone, this.clock.now())), user);
  }

  /** Appends a row the payment provider reported (no user); used by the webhook inside its own transaction. */
  async appendInTransaction(
    tx: EntityManager,
    project: Project,
    draft: EntryDraft & { source: 'payment-provider'; providerRef: string },
  ): Promise<LedgerEntryRow> {
    await this.lock.take(tx, project.id);
    const row = await this.persistRow(tx, project, draft, null);
    const view = await loadAccount(tx, project);
    this.recordActivity(tx, view, row, null);
    return row;
  }

  private async write(
    access: ProjectAccess,
    draft: (tx: EntityManager, view: AccountView) => Promise<EntryDraft>,
    user: AuthUser,
  ): Promise<LedgerEntryResponse> {
    return this.em.transactional(async (tx) => {
      await this.lock.take(tx, access.project.id);
      const view = await loadAccount(tx, access.project);
      const row = await this.persistRow(tx, access.project, await draft(tx, view), user.id);
      await tx.flush();
      const after = await loadAccount(tx, access.project);
      this.recordActivity(tx, after, row, user.id);
      await tx.flush();
      return toEntryResponses(after).find((e) => e.id === row.id)!;
    });
  }

  private async persistRow(
    tx: EntityManager,
    project: Project,
    d: EntryDraft & { source?: 'manual' | 'payment-provider'; providerRef?: string },
    userId: string | null,
  ): Promise<LedgerEntryRow> {
    const [{ n }] = await tx.execute<{ n: number }[]>(`select nextval('ledger_entry_seq')::int as n`);
    const row = tx.create(LedgerEntryRow, {
      ...d,
      project: tx.getReference(Project, project.id),
      seq: Number(n),
      recordedBy: userId ? tx.getReference(User, userId) : null,
    });
    await tx.flush();
    return row;
  }

  private recordActivity(tx: EntityManager, view: AccountView, row: LedgerEntryRow, actorId: string | null): void {
    this.activity.record(tx, {
      projectId: view.data.project.id,
      actorId,
      kind: `account.${row.kind}`,
      subjectType: 'ledger-entry',
      subjectId: row.id,
      summary: describeEntry(view, row),
      data: { kind: row.kind, count: row.count ?? null, amountMinor: row.amountMinor ?? null },
      audience: 'partners',
    });
  }
}

/** Who confirms: the party it is about, or the owner for a party without an account. */
function assertConfirmer(access: ProjectAccess, userId: string, party: NonNullable<LedgerEntryRow['party']>, who: 'handOver' | 'payment' | 'young'): void {
  const mine = party.user ? party.user.id === userId : access.role === 'owner';
  if (!mine) throw new ForbiddenException(refusal(`account.onlyConfirmer.${who}${party.user ? '' : 'OrOwner'}`));
}

function confirmationDraft(view: AccountView, access: ProjectAccess, userId: string, entryId: string, dto: ConfirmEntryRequest, today: string): EntryDraft {
  const row = view.data.rows.find((r) => r.id === entryId);
  if (!row) throw new NotFoundException(refusal('account.noSuchEntry'));
  const date = dto.date ?? today;
  assertNotFutureDate(date, today, 'confirmation');
  const inForce = new Set(view.balances.inForce);
  if (row.kind === 'hand-over') {
    assertConfirmer(access, userId, row.party!, 'handOver');
    if (!inForce.has(row.id)) throw new ConflictException(refusal('account.handOverReversed'));
    if (view.data.rows.some((r) => r.kind === 'arrival' && r.target?.id === row.id && inForce.has(r.id))) {
      throw new ConflictException(refusal('account.handOverConfirmed'));
    }
    if (dto.arrivedAlive === undefined || dto.arrivedDead === undefined) {
      throw new BadRequestException(refusal('account.arrivedCounts'));
    }
    if (dto.arrivedAlive + dto.arrivedDead !== row.count) {
      throw new BadRequestException(refusal('account.arrivedSum', { count: row.count!, got: dto.arrivedAlive + dto.arrivedDead }));
    }
    return { kind: 'arrival', date, target: row, party: row.party!, arrivedAlive: dto.arrivedAlive, arrivedDead: dto.arrivedDead };
  }
  if (row.kind === 'money' || row.kind === 'cash-out' || row.kind === 'sale') {
    const acceptor = acceptorOf(row, view.data.terms?.pricePerSpiderlingMinor ?? 0, view.memberOf);
    if (!acceptor) throw new ConflictException(refusal(`account.alreadyCounts.${row.kind}`));
    assertConfirmer(access, userId, acceptor, row.kind === 'money' ? 'payment' : 'young');
    if (!view.pending.has(row.id)) throw new ConflictException(refusal(`account.alreadyCounts.${row.kind}`));
    if (view.data.rows.some((r) => r.kind === 'correction' && r.target?.id === row.id)) {
      throw new ConflictException(refusal(`account.reversedEntry.${row.kind}`));
    }
    if (row.kind !== 'money') assertWithdrawalFits(view, row);
    return { kind: 'confirmation', date, target: row, party: acceptor };
  }
  throw new BadRequestException(refusal('account.notConfirmable'));
}
