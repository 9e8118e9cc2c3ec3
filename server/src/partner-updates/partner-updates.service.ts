import { Inject, Injectable, NotFoundException, type OnModuleInit } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { EntityManager, MikroORM } from '@mikro-orm/postgresql';
import type { EventSubscriber, FlushEventArgs } from '@mikro-orm/core';
import { serverWordsFor, type FailureNoticePreview, type Language } from '@broodsilk/shared';
import { appConfig } from '../config/app.config';
import { Clock } from '../common/clock';
import { MailOutbox } from '../mail/mail-outbox.service';
import { renderNoticeMail, unsubscribeHeaders } from '../mail/templates/notice-mail';
import { unsubscribeToken } from '../reminders/unsubscribe-token';
import { ActivityEvent } from '../activity/activity-event.entity';
import type { ProjectAccess } from '../projects/project-access.service';
import { ProjectMember } from '../projects/project-member.entity';
import { Sac } from '../sacs/sac.entity';
import { User } from '../users/user.entity';
import { readerFrom } from '../users/reader-words';
import { isPartnerUpdateKind, partnerUpdateWords } from './partner-update-words';
import { badNewsFacts } from './partner-update-facts';
import { ProgressLinksService } from '../progress-links/progress-links.service';
import { writePartnerUpdates, type UpdateLink, type UpdateMailer, type UpdateWords } from './partner-update-writer';
import type { FailureNoticePreviewDto } from './dto/failure-notice-preview.dto';
import { refusal } from '../common/refusal';

/**
 * Partner updates follow the activity events: after every flush that writes an event partners hear
 * about, the updates are written on the same transaction (in-app rows, and the e-mails queued in
 * the outbox, which sends them once the transaction commits). A refused write tells nobody.
 */
@Injectable()
export class PartnerUpdates implements OnModuleInit, EventSubscriber, UpdateMailer {
  constructor(
    private readonly orm: MikroORM,
    private readonly em: EntityManager,
    private readonly outbox: MailOutbox,
    private readonly clock: Clock,
    private readonly progressLinks: ProgressLinksService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  onModuleInit(): void {
    this.orm.em.getEventManager().registerSubscriber(this);
  }

  async afterFlush({ em, uow }: FlushEventArgs): Promise<void> {
    const ids = uow
      .getChangeSets()
      .filter((cs) => cs.type === 'create' && cs.entity instanceof ActivityEvent && isPartnerUpdateKind(cs.entity.kind))
      .map((cs) => (cs.entity as ActivityEvent).id);
    if (!ids.length) return;
    const run = (tx: EntityManager) => this.write(tx, ids);
    if (em.isInTransaction()) await run(em.fork({ keepTransactionContext: true, clear: true }) as EntityManager);
    else await this.orm.em.fork().transactional(run);
  }

  /** Writes the updates of these events on `tx` (also used directly by specs). */
  write(tx: EntityManager, eventIds: string[]): Promise<number> {
    return writePartnerUpdates(tx, eventIds, { now: this.clock.now(), mailer: this });
  }

  private get base(): string {
    return this.app.publicUrl.replace(/\/$/, '');
  }

  private href(link: UpdateLink): string {
    return `${this.base}/${link.type === 'sac' ? 'sacs' : link.type === 'animal' ? 'collection' : 'projects'}/${link.id}`;
  }

  async toMember(
    tx: EntityManager,
    to: { userId: string; email: string; lng: Language; projectTitle: string },
    words: UpdateWords,
    link: UpdateLink,
  ): Promise<void> {
    const t = serverWordsFor(to.lng);
    const unsubscribeUrl = `${this.base}/api/unsubscribe/${unsubscribeToken(this.app.jwtSecret, to.userId, 'partner-update')}`;
    const { html, text } = renderNoticeMail({
      lang: to.lng,
      title: words.title,
      paragraphs: words.paragraphs,
      link: { url: this.href(link), label: t('mail.openInApp') },
      why: t('partnerUpdate.mailWhy', { project: to.projectTitle }),
      unsubscribe: { url: unsubscribeUrl, label: t('partnerUpdate.mailUnsubscribe') },
    });
    await this.outbox.enqueue(tx, {
      to: to.email,
      subject: t('mail.subject', { title: words.title }),
      html,
      text,
      headers: unsubscribeHeaders(unsubscribeUrl),
    });
  }

  /**
   * Bad news to a partner without an account, with a fresh link to their progress page (issuing one
   * revokes their earlier links). No settings to honour, so no unsubscribe link: the keeper is named instead.
   */
  async toOutsideParty(
    tx: EntityManager,
    to: { member: ProjectMember; lng: Language; projectTitle: string; ownerName: string; ownerId: string },
    words: UpdateWords,
    actorId: string | null,
  ): Promise<void> {
    const t = serverWordsFor(to.lng);
    const progress = await this.progressLinks.issue(tx, to.member, { id: actorId ?? to.ownerId });
    const { html, text } = renderNoticeMail({
      lang: to.lng,
      title: words.title,
      paragraphs: words.paragraphs,
      link: { url: progress.url, label: t('partnerUpdate.mailProgress') },
      why: t('partnerUpdate.mailWhyOutside', { owner: to.ownerName, project: to.projectTitle }),
      unsubscribe: null,
    });
    await this.outbox.enqueue(tx, { to: to.member.email!, subject: t('mail.subject', { title: words.title }), html, text });
  }

  /**
   * What the partners will read if the sac is recorded as failed now, in the keeper's language;
   * nothing is written.
   */
  async failurePreview(access: ProjectAccess, viewer: { id: string }, sacId: string, dto: FailureNoticePreviewDto): Promise<FailureNoticePreview> {
    const em = this.em.fork();
    const sac = await em.findOne(Sac, { id: sacId, project: access.project.id }, { fields: ['layDate'] });
    if (!sac) throw new NotFoundException(refusal('sac.notFound'));
    const keeper = await em.findOneOrFail(User, viewer.id);
    const partners = await em.find(ProjectMember, { project: access.project.id, role: 'partner' });
    const message = dto.partnerMessage?.trim() ? dto.partnerMessage : null;
    const words = partnerUpdateWords(readerFrom(keeper), {
      kind: 'sac.failed',
      data: { failureReason: dto.failureReason },
      summary: '',
      projectTitle: access.project.title,
      actorName: keeper.displayName,
      ownerName: keeper.displayName,
      sac: { layDate: sac.layDate },
      animalLabel: null,
      badNews: await badNewsFacts(em, access.project.id, sacId, message),
    });
    return {
      title: words.title,
      body: words.paragraphs.join('\n\n'),
      members: partners.filter((m) => m.user && m.user.id !== viewer.id).length,
      outsideParties: partners.filter((m) => !m.user && m.email).length,
    };
  }
}
