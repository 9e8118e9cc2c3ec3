// @ts-check
// Each read the targets name, as the API path the big keeper calls and as one hand-written SQL
// query fetching the same facts (the yardstick for the "at most 3× bare SQL" target).

/** @typedef {{ keeper: string, project: string, sac: string, partnerMember: string }} Ids */

const PROJECTS_OF = `select p.id, p.title, p.created_at, o.display_name as owner, f.label as female, m.label as male,
    (select json_agg(pm.name) from project_members pm where pm.project_id = p.id and pm.role = 'partner') as partners,
    (select json_agg(json_build_object('id', s.id, 'lay', s.lay_date, 'pulled', s.pulled_at, 'outcome', s.outcome)) from sacs s where s.project_id = p.id) as sacs,
    (select sum(case when le.from_party_id = me.id then -le.amount_minor else le.amount_minor end) from ledger_entries le
      where le.project_id = p.id and le.kind = 'money') as money
  from project_members me join projects p on p.id = me.project_id join users o on o.id = p.owner_id
  join animals f on f.id = p.female_id join animals m on m.id = p.male_id
  where me.user_id = $1 order by p.created_at desc, p.id`;

/** @type {{ name: string, path: (ids: Ids) => string, sql: string, params: (ids: Ids, i: number) => unknown[] }[]} */
export const READS = [
  {
    // The floor under every other row: one signed-in request that reads one row (HTTP, the session
    // check, Nest's pipeline and JSON), so a read's ratio can be told from the framework's own cost.
    name: 'signed-in floor (who am I)',
    path: () => '/api/auth/me',
    sql: `select id, email, display_name, language, time_zone from users where id = $1`,
    params: (ids) => [ids.keeper],
  },
  {
    name: 'dashboard',
    path: () => '/api/dashboard',
    sql: `with mine as (${PROJECTS_OF})
      select (select json_agg(mine) from mine) as projects,
        (select json_agg(x) from (select s.id, s.lay_date, (select max(l.at) from sac_log_entries l where l.sac_id = s.id and l.kind = 'roll') as last_roll
           from sacs s join project_members me on me.project_id = s.project_id and me.user_id = $1 where s.outcome = 'in-progress') x) as sacs,
        (select json_agg(a) from (select a.* from activity_events a join project_members me on me.project_id = a.project_id and me.user_id = $1
           where a.actor_id is distinct from $1 order by a.at desc limit 20) a) as activity`,
    params: (ids) => [ids.keeper],
  },
  {
    name: 'projects list',
    path: () => '/api/projects',
    sql: `select json_agg(x) from (${PROJECTS_OF}) x`,
    params: (ids) => [ids.keeper],
  },
  {
    name: 'project page',
    path: (ids) => `/api/projects/${ids.project}`,
    sql: `select p.*, (select json_agg(pm) from project_members pm where pm.project_id = p.id) as members,
        (select json_agg(tl) from terms_versions tv join terms_lines tl on tl.version_id = tv.id where tv.project_id = p.id) as terms,
        (select json_agg(s) from sacs s where s.project_id = p.id) as sacs
      from projects p where p.id = $1`,
    params: (ids) => [ids.project],
  },
  {
    name: 'sac page',
    path: (ids) => `/api/sacs/${ids.sac}`,
    sql: `select s.*, (select max(at) from sac_log_entries l where l.sac_id = s.id and l.kind = 'roll') as last_roll,
        (select row_to_json(b) from brood_counts b where b.sac_id = s.id order by b.at desc limit 1) as latest_count
      from sacs s where s.id = $1`,
    params: (ids) => [ids.sac],
  },
  {
    name: 'care log of a sac (first page of 100)',
    path: (ids) => `/api/sacs/${ids.sac}/log?limit=100`,
    sql: `select json_agg(x) from (select l.* from sac_log_entries l where l.sac_id = $1
        order by l.at desc, l.created_at desc, l.id desc limit 101) x`,
    params: (ids) => [ids.sac],
  },
  {
    name: 'animals, filtered',
    path: () => '/api/animals?limit=50&sex=female&status=active&q=C-0&sort=label',
    sql: `select a.*, count(*) over () as total from animals a
      where a.recorded_by_id = $1 and a.sex = 'female' and a.status = 'active' and a.label ilike 'C-0%' order by a.label limit 50`,
    params: (ids) => [ids.keeper],
  },
  {
    name: 'shares',
    path: (ids) => `/api/projects/${ids.project}/shares`,
    sql: `select (select json_agg(tl) from terms_versions tv join terms_lines tl on tl.version_id = tv.id where tv.project_id = $1) as lines,
        (select json_agg(x) from (select distinct on (b.sac_id) b.sac_id, b.alive from brood_counts b join sacs s on s.id = b.sac_id
          where s.project_id = $1 order by b.sac_id, b.at desc) x) as counts`,
    params: (ids) => [ids.project],
  },
  {
    name: 'balances',
    path: (ids) => `/api/projects/${ids.project}/balances`,
    sql: `select pm.id, pm.name, coalesce(sum(le.amount_minor) filter (where le.to_party_id = pm.id), 0) as received,
        coalesce(sum(le.amount_minor) filter (where le.from_party_id = pm.id), 0) as paid
      from project_members pm left join ledger_entries le on le.project_id = pm.project_id and (le.to_party_id = pm.id or le.from_party_id = pm.id)
      where pm.project_id = $1 group by pm.id, pm.name`,
    params: (ids) => [ids.project],
  },
  {
    name: 'ledger entries (first page of 100)',
    path: (ids) => `/api/projects/${ids.project}/entries?limit=100`,
    sql: `select json_agg(x) from (select le.* from ledger_entries le where le.project_id = $1 order by le.seq limit 101) x`,
    params: (ids) => [ids.project],
  },
  {
    name: 'statement data',
    path: (ids) => `/api/projects/${ids.project}/statements/${ids.partnerMember}`,
    sql: `select json_agg(le order by le.seq) from ledger_entries le
      where le.project_id = $1 and $2 in (le.party_id, le.from_party_id, le.to_party_id)`,
    params: (ids) => [ids.project, ids.partnerMember],
  },
];

/** The write the targets name: a care-log entry, and the bare insert of the same row. */
export const CARE_LOG_WRITE = {
  name: 'POST care-log entry',
  path: (/** @type {Ids} */ ids) => `/api/sacs/${ids.sac}/log`,
  body: JSON.stringify({ kind: 'check', text: 'bench check' }),
  sql: `insert into sac_log_entries (id, created_at, updated_at, sac_id, kind, at, author_id, text)
    values (gen_random_uuid(), now(), now(), $1, 'check', now(), $2, 'bench check')`,
  params: (/** @type {Ids} */ ids) => [ids.sac, ids.keeper],
};
