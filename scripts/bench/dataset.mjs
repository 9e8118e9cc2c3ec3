// @ts-check
// The benchmark's dataset, written set-based (INSERT … SELECT over generate_series) into a migrated,
// throw-away database. Sizes follow the speed targets in docs/performance.md, times `scale`.
// One keeper (the "big keeper", who signs in for the reads) owns 200 projects; the rest spread
// over 99 other keepers. Every figure is invented; nothing here resembles a real collection.

/** @param {number} scale */
export function datasetSizes(scale) {
  const n = (/** @type {number} */ full) => Math.max(1, Math.round(full * scale));
  return {
    keepers: Math.max(3, n(100)),
    animals: n(50_000),
    projects: Math.max(n(5_000), n(200) + 1),
    bigKeeperProjects: n(200),
    sacs: n(10_000),
    careLog: n(500_000),
    ledger: n(50_000),
    activity: n(20_000),
  };
}

/**
 * @param {import('pg').Client} db
 * @param {{ bigKeeperId: string, partnerId: string, passwordHash: string, scale: number, step: (label: string) => void }} o
 */
export async function seedDataset(db, o) {
  const s = datasetSizes(o.scale);
  const q = (/** @type {string} */ sql, /** @type {unknown[]} */ params = []) => db.query(sql, params);

  o.step('keepers');
  // Keepers 1 and 2 are the two accounts registered through the API (so their passwords work).
  await q(
    `insert into users (id, created_at, updated_at, email, password_hash, display_name, role, time_zone, temperature_unit, token_version)
    select gen_random_uuid(), now(), now(), 'bench.keeper.' || lpad(g::text, 4, '0') || '@example.test', $1, 'Bench keeper ' || g, 'keeper', 'Europe/Berlin', 'C', 0
    from generate_series(3, $2) g`,
    [o.passwordHash, s.keepers],
  );
  await q(
    `create temporary table bench_keepers as
    select 1 as n, $1::uuid as id union all select 2, $2::uuid
    union all select 2 + row_number() over (order by email), id from users where email like 'bench.keeper.%'`,
    [o.bigKeeperId, o.partnerId],
  );

  o.step('animals');
  // Projects 1…bigKeeperProjects belong to keeper 1; the others round-robin over keepers 2…N.
  await q(
    `create temporary table bench_projects as
    select g as n, gen_random_uuid() as id, gen_random_uuid() as female_id, gen_random_uuid() as male_id,
           case when g <= $1 then 1 else 2 + (g % ($2 - 1)) end as keeper_n
    from generate_series(1, $3) g`,
    [s.bigKeeperProjects, s.keepers, s.projects],
  );
  const species = (await q(`select array_agg(id) as ids from species`)).rows[0].ids;
  for (const [column, sex] of [
    ['female_id', 'female'],
    ['male_id', 'male'],
  ]) {
    await q(
      `insert into animals (id, created_at, updated_at, recorded_by_id, species_id, label, sex, maturity, matured_on, owner_kind, owner_user_id, custody, status)
      select p.${column}, now(), now(), k.id, ($1::uuid[])[1 + p.n % array_length($1::uuid[], 1)], '${sex[0].toUpperCase()}-' || p.n, '${sex}', 'mature',
             current_date - (30 + p.n % 200), 'self', k.id, 'with-owner', 'active'
      from bench_projects p join bench_keepers k on k.n = p.keeper_n`,
      [species],
    );
  }
  await q(
    `insert into animals (id, created_at, updated_at, recorded_by_id, species_id, label, sex, maturity, owner_kind, owner_user_id, custody, status)
    select gen_random_uuid(), now() - (g || ' minutes')::interval, now(), k.id, ($1::uuid[])[1 + g % array_length($1::uuid[], 1)], 'C-' || lpad(g::text, 6, '0'),
           (array['female','male','unsexed'])[1 + g % 3]::animal_sex, 'immature', 'self', k.id, 'with-owner',
           (array['active','active','active','sold','deceased'])[1 + g % 5]::animal_status
    from generate_series(1, greatest(0, $2 - 2 * $3)) g join bench_keepers k on k.n = 1 + g % $4`,
    [species, s.animals, s.projects, s.keepers],
  );

  o.step('projects, members, terms');
  await q(`insert into projects (id, created_at, updated_at, owner_id, female_id, male_id, title)
    select p.id, now() - (p.n || ' hours')::interval, now(), k.id, p.female_id, p.male_id, 'Bench pair ' || p.n
    from bench_projects p join bench_keepers k on k.n = p.keeper_n`);
  await q(`insert into project_accounts (id, created_at, updated_at, project_id) select gen_random_uuid(), now(), now(), id from bench_projects`);
  // The owner, and as partner the next keeper (keeper 2 for the big keeper's projects).
  await q(
    `create temporary table bench_members as
    select p.id as project_id, gen_random_uuid() as owner_member, gen_random_uuid() as partner_member, o.id as owner_user, pk.id as partner_user
    from bench_projects p join bench_keepers o on o.n = p.keeper_n
    join bench_keepers pk on pk.n = case when p.keeper_n in (1, $1) then 2 else p.keeper_n + 1 end`,
    [s.keepers],
  );
  await q(`insert into project_members (id, created_at, updated_at, project_id, user_id, role, name)
    select owner_member, now(), now(), project_id, owner_user, 'owner'::project_role, 'Owner' from bench_members
    union all
    select partner_member, now(), now(), project_id, partner_user, 'partner'::project_role, 'Partner' from bench_members`);
  await q(`create temporary table bench_terms as select project_id, gen_random_uuid() as id from bench_members`);
  await q(`insert into terms_versions (id, created_at, updated_at, project_id, number, created_by_id, price_per_spiderling_minor, currency, failure_clause, hand_over_stage, shipping_paid_by)
    select t.id, now(), now(), t.project_id, 1, m.owner_user, 500, 'EUR', 'nothing-owed', 'second-instar', 'recipient'
    from bench_terms t join bench_members m using (project_id)`);
  await q(`insert into terms_lines (id, created_at, updated_at, version_id, member_id, weight, fixed_count, pick_order)
    select gen_random_uuid(), now(), now(), t.id, m.owner_member, 2, 0, 1 from bench_terms t join bench_members m using (project_id)
    union all
    select gen_random_uuid(), now(), now(), t.id, m.partner_member, 1, 0, 2 from bench_terms t join bench_members m using (project_id)`);
  await q(`insert into terms_acceptances (id, created_at, updated_at, version_id, member_id, recorded_by_id)
    select gen_random_uuid(), now(), now(), t.id, m.partner_member, m.partner_user from bench_terms t join bench_members m using (project_id)`);

  o.step('sacs and brood counts');
  await q(
    `create temporary table bench_sacs as
    select g as n, gen_random_uuid() as id, p.id as project_id, p.keeper_n from generate_series(1, $1) g
    join bench_projects p on p.n = 1 + (g - 1) % $2`,
    [s.sacs, s.projects],
  );
  await q(`insert into sacs (id, created_at, updated_at, project_id, lay_date, outcome, recorded_by_id, pulled_at, pulled_on)
    select b.id, now(), now(), b.project_id, current_date - (5 + b.n % 60), 'in-progress', k.id,
           case when b.n % 2 = 0 then now() - interval '2 days' end, case when b.n % 2 = 0 then current_date - 2 end
    from bench_sacs b join bench_keepers k on k.n = b.keeper_n`);
  await q(`insert into brood_counts (id, created_at, updated_at, sac_id, at, stage, alive, source)
    select gen_random_uuid(), now(), now(), id, now() - interval '1 day', 'first-instar', 100 + n % 400, 'count' from bench_sacs where n % 4 = 0`);

  o.step('care log');
  await q(
    `insert into sac_log_entries (id, created_at, updated_at, sac_id, kind, at, author_id, temperature_c, humidity_percent)
    select gen_random_uuid(), now(), now(), b.id, (array['roll','roll','temperature','humidity','check'])[1 + g % 5]::care_log_kind,
           now() - ((g / $2) * 12 || ' hours')::interval, k.id,
           case when g % 5 = 2 then 24 + (g % 30) / 10.0 end, case when g % 5 = 3 then 70 + g % 10 end
    from generate_series(0, $1 - 1) g join bench_sacs b on b.n = 1 + g % $2 join bench_keepers k on k.n = b.keeper_n`,
    [s.careLog, s.sacs],
  );

  o.step('ledger');
  await q(
    `insert into ledger_entries (id, created_at, updated_at, project_id, seq, kind, date, from_party_id, to_party_id, amount_minor, currency, source, recorded_by_id)
    select gen_random_uuid(), now(), now(), m.project_id, nextval('ledger_entry_seq'), 'money', current_date - g % 300,
           m.partner_member, m.owner_member, 100 + g % 5000, 'EUR', 'manual', m.owner_user
    from generate_series(0, $1 - 1) g
    join (select row_number() over (order by project_id) as n, * from bench_members) m on m.n = 1 + g % $2`,
    [s.ledger, s.projects],
  );

  o.step('activity');
  await q(
    `insert into activity_events (id, created_at, updated_at, project_id, actor_id, kind, subject_type, subject_id, summary, data, audience, at)
    select gen_random_uuid(), now(), now(), m.project_id, m.partner_user, 'sac.laid', 'project', m.project_id, 'Bench event ' || g, '{}', 'members',
           now() - (g || ' minutes')::interval
    from generate_series(0, $1 - 1) g
    join (select row_number() over (order by project_id) as n, * from bench_members) m on m.n = 1 + g % $2`,
    [s.activity, s.projects],
  );

  o.step('analyze');
  await q('analyze');
  return s;
}
