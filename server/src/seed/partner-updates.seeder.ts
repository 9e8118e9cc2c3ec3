import { ActivityEvent } from '../activity/activity-event.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { PARTNER_UPDATE_KINDS } from '../partner-updates/partner-update-words';
import { writePartnerUpdates } from '../partner-updates/partner-update-writer';
import type { FeatureSeeder } from './demo-seed';

/** How many of the latest events the demo partner hears about (in-app; the seed sends no e-mail). */
export const DEMO_PARTNER_UPDATES = 6;

/**
 * The demo partner's inbox: the latest events of the projects Tomasz is a partner in, told as
 * partner updates. Written without e-mail (the seed runs without the job queue); the keys are the
 * live path's, so an update the app already wrote while seeding is not written twice.
 */
export const seedPartnerUpdates: FeatureSeeder = async ({ em, users, today }) => {
  const memberships = await em.find(ProjectMember, { user: users.partner, role: 'partner' }, { fields: ['project'] });
  const events = await em.find(
    ActivityEvent,
    { project: { $in: memberships.map((m) => m.project.id) }, kind: { $in: Object.keys(PARTNER_UPDATE_KINDS) }, actor: { $ne: users.partner } },
    { orderBy: { at: 'desc', createdAt: 'desc' }, limit: DEMO_PARTNER_UPDATES, fields: ['id'] },
  );
  await writePartnerUpdates(
    em,
    events.map((e) => e.id),
    { now: today, mailer: null, anyAge: true },
  );
};
