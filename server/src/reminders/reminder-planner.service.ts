import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleInit } from '@nestjs/common';
import { EntityManager, MikroORM } from '@mikro-orm/postgresql';
import type { EventSubscriber, FlushEventArgs } from '@mikro-orm/core';
import type { CareLogKind } from '@broodsilk/shared';
import { JobsService } from '../jobs/jobs.service';
import { Clock } from '../common/clock';
import { Sac } from '../sacs/sac.entity';
import { SacLogEntry } from '../sacs/sac-log-entry.entity';
import { Animal } from '../animals/animal.entity';
import { Molt } from '../animals/molt.entity';
import { Project } from '../projects/project.entity';
import { ProjectMember } from '../projects/project-member.entity';
import { User } from '../users/user.entity';
import { ReminderSettings } from './reminder-settings.entity';
import { animalFactsOf, digestRecipients, sacFactsOf } from './reminder-facts';
import { planAnimalReminders, planDigest, planSacReminders } from './planning/plan-reminders';
import type { PlannedReminder } from './planning/reminder-plan.types';
import type { QueueName } from '../jobs/job-queues';

export const REMINDER_QUEUE = 'reminder' satisfies QueueName;

/** What a reminder job carries: enough to find its subject again and re-check it is still true. */
export interface ReminderJob {
  /** `sac:<id>`, `animal:<id>` or `digest:<userId>`: whose plan it belongs to. */
  plannedFor: string;
  key: string;
  sendAt: string;
}

/** The jobs of one subject: its plan's instant is part of the singleton key, so a moved reminder is a new job. */
const singletonKey = (r: PlannedReminder) => `${r.key}@${r.sendAt.toISOString()}`;

/** What changed in a flush, as subjects to re-plan. */
interface Changed {
  sacs: Set<string>;
  animals: Set<string>;
  projects: Set<string>;
  users: Set<string>;
}

/**
 * Plans reminders from the facts and keeps pg-boss in step: after every flush that touches a
 * sac, its care log, an animal, a molt, a project, its members or someone's reminder settings, the subject's
 * plan is made afresh and its jobs are scheduled (`startAfter`, one singleton key per reminder
 * and instant) or cancelled, in the same transaction as the write.
 */
/**
 * Care-log entries a sac's reminders depend on: its latest roll and readings (sacFactsOf), and a
 * strike that may take one back. A check or a note changes no plan, so it costs no replanning.
 */
const PLAN_CHANGING_LOG_KINDS: ReadonlySet<CareLogKind> = new Set(['roll', 'temperature', 'humidity', 'stage', 'strike']);

@Injectable()
export class ReminderPlanner implements OnModuleInit, OnApplicationBootstrap, EventSubscriber {
  private readonly logger = new Logger(ReminderPlanner.name);

  constructor(
    private readonly orm: MikroORM,
    private readonly jobs: JobsService,
    private readonly clock: Clock,
  ) {}

  onModuleInit(): void {
    this.orm.em.getEventManager().registerSubscriber(this);
  }

  /**
   * Catches up at start: records written without the app (the demo seed, a restored backup) get
   * their plan. Safe to repeat and to run on several instances: a plan already queued is kept.
   */
  onApplicationBootstrap(): void {
    if (!this.jobs.plannedWorkersOn) return;
    // In the background, once the queue runs: the app serves meanwhile (a big collection takes a while).
    void this.jobs
      .whenRunning()
      .then(() => this.planAll())
      .then((n) => this.logger.log(`reminders planned at start: ${n.sacs} sacs, ${n.animals} animals, ${n.users} digests`))
      .catch((e: Error) => this.logger.error(`planning reminders at start failed: ${e.message}`));
  }

  async planAll(batch = 200): Promise<{ sacs: number; animals: number; users: number }> {
    const em = this.orm.em.fork();
    const sacIds = (await em.find(Sac, { outcome: 'in-progress', project: { endedOn: null, closedOn: null } }, { fields: ['id'] })).map((s) => s.id);
    const animalIds = (await em.find(Animal, { status: { $in: ['active', 'on-loan'] } }, { fields: ['id'] })).map((a) => a.id);
    const userIds = (await em.find(ReminderSettings, { digestHour: { $ne: null } }, { fields: ['user'] })).map((s) => s.user.id);
    for (let i = 0; i < sacIds.length; i += batch) await em.fork().transactional((tx) => this.replanSacs(tx, sacIds.slice(i, i + batch)));
    for (let i = 0; i < animalIds.length; i += batch) await em.fork().transactional((tx) => this.replanAnimals(tx, animalIds.slice(i, i + batch)));
    if (userIds.length) await em.fork().transactional((tx) => this.replanDigests(tx, userIds));
    return { sacs: sacIds.length, animals: animalIds.length, users: userIds.length };
  }

  getSubscribedEntities() {
    return [Sac, SacLogEntry, Animal, Molt, Project, ProjectMember, ReminderSettings, User];
  }

  async afterFlush({ em, uow }: FlushEventArgs): Promise<void> {
    const changed: Changed = { sacs: new Set(), animals: new Set(), projects: new Set(), users: new Set() };
    for (const cs of uow.getChangeSets()) {
      const e = cs.entity as object;
      if (e instanceof Sac) changed.sacs.add(e.id);
      else if (e instanceof SacLogEntry && PLAN_CHANGING_LOG_KINDS.has(e.kind)) changed.sacs.add(e.sac.id);
      else if (e instanceof Animal) changed.animals.add(e.id);
      else if (e instanceof Molt) changed.animals.add(e.animal.id);
      else if (e instanceof Project && cs.type === 'update') changed.projects.add(e.id);
      else if (e instanceof ProjectMember && e.project) changed.projects.add(e.project.id);
      else if (e instanceof ReminderSettings) changed.users.add(e.user.id);
      else if (e instanceof User && cs.type === 'update' && 'timeZone' in (cs.payload as object)) changed.users.add(e.id);
    }
    if (!changed.sacs.size && !changed.animals.size && !changed.projects.size && !changed.users.size) return;
    const run = (tx: EntityManager) => this.replan(tx, changed);
    if (em.isInTransaction()) await run(em.fork({ keepTransactionContext: true, clear: true }) as EntityManager);
    else await this.orm.em.fork().transactional(run);
  }

  private async replan(tx: EntityManager, c: Changed): Promise<void> {
    const sacIds = new Set(c.sacs);
    const animalIds = new Set(c.animals);
    if (c.projects.size) {
      for (const s of await tx.find(Sac, { project: { $in: [...c.projects] } }, { fields: ['id'] })) sacIds.add(s.id);
    }
    if (c.users.size) {
      const users = [...c.users];
      const memberships = await tx.find(ProjectMember, { user: { $in: users }, role: { $in: ['owner', 'caretaker'] } }, { fields: ['project'] });
      const projects = [...new Set(memberships.map((m) => m.project.id))];
      for (const s of await tx.find(Sac, { outcome: 'in-progress', project: { $in: projects } }, { fields: ['id'] })) sacIds.add(s.id);
      for (const a of await tx.find(Animal, { recordedBy: { $in: users }, status: { $in: ['active', 'on-loan'] } }, { fields: ['id'] })) animalIds.add(a.id);
      await this.replanDigests(tx, users);
    }
    await this.replanSacs(tx, [...sacIds]);
    await this.replanAnimals(tx, [...animalIds]);
  }

  async replanSacs(tx: EntityManager, ids: string[]): Promise<void> {
    const now = this.clock.now();
    const facts = await sacFactsOf(tx, ids);
    const plans = new Map<string, PlannedReminder[]>(ids.map((id) => [`sac:${id}`, []]));
    for (const f of facts) plans.set(`sac:${f.id}`, planSacReminders(f, now));
    await this.schedule(tx, plans);
  }

  async replanAnimals(tx: EntityManager, ids: string[]): Promise<void> {
    const now = this.clock.now();
    const facts = await animalFactsOf(tx, ids, now);
    const plans = new Map<string, PlannedReminder[]>(ids.map((id) => [`animal:${id}`, []]));
    for (const f of facts) plans.set(`animal:${f.id}`, planAnimalReminders(f, now));
    await this.schedule(tx, plans);
  }

  async replanDigests(tx: EntityManager, userIds: string[]): Promise<void> {
    const now = this.clock.now();
    const plans = new Map<string, PlannedReminder[]>();
    for (const r of await digestRecipients(tx, userIds)) {
      const next = planDigest(r, now);
      plans.set(`digest:${r.userId}`, next ? [next] : []);
    }
    await this.schedule(tx, plans);
  }

  /**
   * Makes the pending jobs of each subject match its plan: waiting jobs that left it are cancelled,
   * new reminders are queued; a running job is left to finish, and what was sent stays sent. The
   * jobs are read before `reminder_sent`: a job that finishes in between has committed its key.
   * A fixed number of statements for any number of subjects.
   */
  private async schedule(tx: EntityManager, plans: Map<string, PlannedReminder[]>): Promise<void> {
    if (!plans.size) return;
    const pending = await this.jobs.pendingFor(tx, REMINDER_QUEUE, [...plans.keys()]);
    const sent = await sentKeys(
      tx,
      [...plans.values()].flat().map((r) => r.key),
    );
    const wanted = new Map<string, { plannedFor: string; r: PlannedReminder }>();
    for (const [plannedFor, plan] of plans) for (const r of plan) if (!sent.has(r.key)) wanted.set(singletonKey(r), { plannedFor, r });
    const obsolete = pending.filter((j) => !j.running && (!j.singletonKey || wanted.get(j.singletonKey)?.plannedFor !== j.plannedFor));
    await this.jobs.cancel(
      tx,
      REMINDER_QUEUE,
      obsolete.map((j) => j.id),
    );
    const queued = new Set(pending.map((j) => j.singletonKey));
    await this.jobs.sendMany<ReminderJob>(
      tx,
      REMINDER_QUEUE,
      [...wanted]
        .filter(([key]) => !queued.has(key))
        .map(([key, { plannedFor, r }]) => ({ data: { plannedFor, key: r.key, sendAt: r.sendAt.toISOString() }, startAfter: r.sendAt, singletonKey: key })),
    );
  }
}

async function sentKeys(tx: EntityManager, keys: string[]): Promise<Set<string>> {
  if (!keys.length) return new Set();
  const rows = await tx
    .getConnection()
    .execute<{ key: string }[]>(`select key from reminder_sent where key in (${keys.map(() => '?').join(', ')})`, keys, 'all', tx.getTransactionContext());
  return new Set(rows.map((r) => r.key));
}
