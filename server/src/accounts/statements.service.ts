import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { StatementResponse } from '@broodsilk/shared';
import type { ProjectAccess } from '../projects/project-access.service';
import { MailService } from '../mail/mail.service';
import { loadAccount } from './account-loader';
import { memberName, type AccountView } from './account-view';
import { FROM_OWNER, toEntryResponses } from './accounts.mapper';
import type { ProjectMember } from '../projects/project-member.entity';
import type { LedgerEntryRow } from './ledger-entry.entity';
import { failureNote, toSacSharesView, toTermsSummary } from './shares.mapper';
import { isProvisional } from './balances.mapper';
import { statementCsv } from './statement-csv';
import { statementPdf } from './statement-pdf';
import { Clock } from '../common/clock';
import { loadReader, type Reader } from '../users/reader-words';
import { refusal } from '../common/refusal';

/**
 * Whether a row concerns the party, made by or to them: it names them, they recorded it, it moves
 * young out of the owner's brood and they are the owner, or it confirms, counts or corrects such a row.
 */
function concerns(row: LedgerEntryRow, member: ProjectMember, ownerId: string, depth = 0): boolean {
  const id = member.id;
  if (row.party?.id === id || row.fromParty?.id === id || row.toParty?.id === id) return true;
  if (member.user && row.recordedBy?.id === member.user.id) return true;
  if (id === ownerId && FROM_OWNER.has(row.kind)) return true;
  return depth < 50 && !!row.target && concerns(row.target, member, ownerId, depth + 1);
}

@Injectable()
export class StatementsService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly mail: MailService,
  ) {}

  /** The statement with its sentences (share explanations, failure notes) in `reader`'s words: the asker's unless said. */
  async statement(access: ProjectAccess, memberId: string, reader?: Reader): Promise<StatementResponse> {
    return this.build(await this.viewFor(access, memberId), memberId, reader ?? (await loadReader(this.em, access.member.user)));
  }

  /** The CSV with its header row and words in the language of the member who asks for it. */
  async csv(access: ProjectAccess, memberId: string): Promise<{ filename: string; body: string }> {
    const reader = await loadReader(this.em, access.member.user);
    const s = await this.statement(access, memberId, reader);
    return { filename: fileName(s, 'csv'), body: statementCsv(s, reader) };
  }

  /** The PDF in the language and stage numbering of the member who asks for it. */
  async pdf(access: ProjectAccess, memberId: string): Promise<{ filename: string; body: Buffer }> {
    const reader = await loadReader(this.em, access.member.user);
    const s = await this.statement(access, memberId, reader);
    return { filename: fileName(s, 'pdf'), body: await statementPdf(s, reader) };
  }

  /**
   * E-mails the statement (PDF attached) to the party's address: their account's, else the one the
   * owner noted; written in the recipient's language (English for a party without an account).
   */
  async email(access: ProjectAccess, memberId: string): Promise<{ sentTo: string }> {
    const view = await this.viewFor(access, memberId);
    const member = view.data.members.find((m) => m.id === memberId)!;
    const to = member.user?.email ?? member.email;
    if (!to) throw new NotFoundException(refusal('account.noEmail', { name: memberName(member) }));
    const reader = await loadReader(this.em, member.user);
    const s = this.build(view, memberId, reader);
    const b = s.balance;
    const { t } = reader;
    await this.mail.send({
      to,
      subject: t('statement.mailSubject', { project: s.project.title, party: s.party.name }),
      text: [
        t('statement.mailHello', { name: s.party.name }),
        '',
        t('statement.mailAttached', { project: s.project.title }),
        b
          ? t('statement.mailBalance', {
              share: t(s.provisional ? 'statement.shareProvisional' : 'statement.share', { count: b.share }),
              owed: t('statement.stillOwed', { count: b.owedSpiderlings }),
            })
          : t('statement.noTerms'),
        '',
        'Broodsilk',
      ].join('\n'),
      attachments: [{ filename: fileName(s, 'pdf'), content: await statementPdf(s, reader), contentType: 'application/pdf' }],
    });
    return { sentTo: to };
  }

  private async viewFor(access: ProjectAccess, memberId: string): Promise<AccountView> {
    if (access.role !== 'owner' && access.member.id !== memberId) {
      throw new ForbiddenException(refusal('account.ownStatementOnly'));
    }
    const view = await loadAccount(this.em, access.project);
    const member = view.data.members.find((m) => m.id === memberId);
    if (!member || member.role === 'caretaker') throw new NotFoundException(refusal('account.noSuchParty'));
    return view;
  }

  private build(view: AccountView, memberId: string, { t }: Reader): StatementResponse {
    const member = view.data.members.find((m) => m.id === memberId)!;
    const mine = new Set(view.data.rows.filter((r) => concerns(r, member, view.owner.id)).map((r) => r.id));
    const entries = toEntryResponses(view).filter((e) => mine.has(e.id));
    const balance = view.balances.parties.find((p) => p.partyId === memberId);
    return {
      project: { id: view.data.project.id, title: view.data.project.title },
      party: { memberId, name: memberName(member), role: member.role },
      generatedAt: this.clock.now().toISOString(),
      terms: view.data.terms ? toTermsSummary(view.data.terms) : null,
      sacs: view.sacs.map((s) => toSacSharesView(view, s, null, t)),
      entries,
      balance: balance ? { ...balance, memberId, name: memberName(member) } : null,
      provisional: isProvisional(view),
      debts: view.balances.debts
        .filter((d) => d.fromPartyId === memberId || d.toPartyId === memberId)
        .map((d) => ({ ...d, fromName: view.nameOf(d.fromPartyId), toName: view.nameOf(d.toPartyId) })),
      failureNotes: view.sacs.map((s) => failureNote(view, s, t)).filter((x): x is string => !!x),
      hasShipment: entries.some((e) => e.kind === 'hand-over' && e.method === 'shipment'),
    };
  }
}

function fileName(s: StatementResponse, ext: string): string {
  const slug = (x: string) =>
    x
      .toLowerCase()
      .normalize('NFKD')
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'party';
  return `statement-${slug(s.project.title)}-${slug(s.party.name)}.${ext}`;
}
