import { Inject, Injectable, NotFoundException, StreamableFile } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { EntityManager } from '@mikro-orm/postgresql';
import ical from 'ical-generator';
import type { CalendarFeedResponse } from '@broodsilk/shared';
import { appConfig } from '../config/app.config';
import type { AuthUser } from '../common/auth-user';
import { User } from '../users/user.entity';
import { readerFrom, type Reader } from '../users/reader-words';
import { ProjectMember } from '../projects/project-member.entity';
import { AnimalsService } from '../animals/animals.service';
import { Sac } from '../sacs/sac.entity';
import { SAC_POPULATE, SacViewsService } from '../sacs/sac-views.service';
import { CalendarFeed } from './calendar-feed.entity';
import { feedToken, hashToken, revokeFeeds } from './feed-token';
import { maleClockEvents, sacEvents, type FeedEvent } from './feed-events';
import { expectedStageDays } from '../species/stage-days';
import { Clock } from '../common/clock';
import { refusal } from '../common/refusal';

@Injectable()
export class CalendarService {
  constructor(
    private readonly em: EntityManager,
    private readonly clock: Clock,
    private readonly views: SacViewsService,
    private readonly animals: AnimalsService,
    @Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>,
  ) {}

  private describe(feed: CalendarFeed): CalendarFeedResponse {
    const path = `/api/calendar/${feedToken(this.config.calendarSecret, feed.id)}.ics`;
    return { url: `${this.config.publicUrl.replace(/\/$/, '')}${path}`, path, createdAt: feed.createdAt.toISOString() };
  }

  private create(em: EntityManager, userId: string): CalendarFeed {
    const feed = em.create(CalendarFeed, { user: em.getReference(User, userId), tokenHash: '' });
    feed.tokenHash = hashToken(feedToken(this.config.calendarSecret, feed.id));
    return feed;
  }

  /** The user's current feed, created on first ask. */
  async current(viewer: AuthUser): Promise<CalendarFeedResponse> {
    const feed = await this.em.transactional(async (tx) => {
      return (await tx.findOne(CalendarFeed, { user: viewer.id, revokedAt: null })) ?? this.create(tx, viewer.id);
    });
    return this.describe(feed);
  }

  /** Revokes every live feed of the user and issues a new one, in one transaction. */
  async rotate(viewer: AuthUser): Promise<CalendarFeedResponse> {
    const feed = await this.em.transactional(async (tx) => {
      await revokeFeeds(tx, viewer.id, this.clock.now());
      return this.create(tx, viewer.id);
    });
    return this.describe(feed);
  }

  /** The feed as a file, so its content type is set only on success (errors stay JSON). */
  async file(token: string): Promise<StreamableFile> {
    const body = Buffer.from(await this.render(token), 'utf8');
    return new StreamableFile(body, { type: 'text/calendar; charset=utf-8', length: body.length });
  }

  /** The iCalendar text for a token; unknown or revoked tokens are a 404. */
  async render(token: string): Promise<string> {
    const feed = await this.em.findOne(CalendarFeed, { tokenHash: hashToken(token), revokedAt: null }, { populate: ['user'] });
    if (!feed) throw new NotFoundException(refusal('timeline.noSuchFeed'));
    const u = feed.user;
    const viewer: AuthUser = { id: u.id, email: u.email, role: u.role, timeZone: u.timeZone, mustEnrolSecondFactor: false };
    const reader = readerFrom(u);
    const events = [...(await this.sacEvents(viewer, reader)), ...(await this.animals.malesByClock(viewer)).flatMap((m) => maleClockEvents(m, reader))];
    const cal = ical({ name: 'Broodsilk', prodId: { company: 'Broodsilk', product: 'breeding-calendar', language: 'EN' } });
    // Dates stay floating calendar dates (no time zone): all-day events, DTEND exclusive (RFC 5545 §3.6.1).
    for (const e of events)
      cal.createEvent({ id: e.uid, start: e.start, end: e.end, allDay: true, summary: e.summary, description: e.description, stamp: feed.createdAt });
    return cal.toString();
  }

  private async sacEvents(viewer: AuthUser, reader: Reader): Promise<FeedEvent[]> {
    const memberships = await this.em.find(ProjectMember, { user: viewer.id });
    const sacs = await this.em.find(
      Sac,
      { project: { $in: memberships.map((m) => m.project.id) }, outcome: 'in-progress' },
      { populate: SAC_POPULATE, orderBy: { layDate: 'asc' } },
    );
    const responses = await this.views.build(this.em, sacs, viewer.timeZone);
    return sacs.flatMap((s, i) => sacEvents(s.project.title, responses[i], expectedStageDays(s.project.female.species), reader));
  }
}
