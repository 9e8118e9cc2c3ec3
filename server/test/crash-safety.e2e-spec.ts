import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { todayIn } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { accountScenario, type AccountScenario } from './accounts.fixtures';

/**
 * The built server (`server/dist/main.js`, as `npm start` runs it) is killed with SIGKILL in the
 * middle of a burst of care-log and ledger writes, then started again. Every write that was
 * acknowledged (2xx) must be there, each multi-step write must be whole (an entry and its activity
 * record together, or neither), and a client retrying an unanswered write with its
 * Idempotency-Key never gets it written twice. PostgreSQL's durability of a committed transaction
 * (its write-ahead log) is what makes this hold; the test proves the app only answers after commit.
 */
const main = fileURLToPath(new URL('../dist/main.js', import.meta.url));
const WORKERS = 6;
const KILL_AFTER_ACKS = 24;

let t: TestApp;
let s: AccountScenario;
let child: ChildProcess | null = null;

interface Write {
  kind: 'care' | 'ledger';
  key: string;
  /** Unique words in the entry, to find it again. */
  marker: string;
  ackedId?: string;
}

const freePort = () =>
  new Promise<number>((resolve) => {
    const srv = createServer().listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
  });

async function startServer(port: number): Promise<ChildProcess> {
  const proc = spawn(process.execPath, [main], {
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', CLIENT_DIST: '', JOBS_ENABLED: 'false', NODE_ENV: 'production', LOG_LEVEL: 'silent' },
    stdio: 'ignore',
  });
  for (let i = 0; i < 300; i++) {
    if (proc.exitCode !== null) throw new Error(`the server exited with ${proc.exitCode} while starting`);
    const up = await fetch(`http://127.0.0.1:${port}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (up) return proc;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the server did not start within 30 s');
}

function send(port: number, w: Write): Promise<Response> {
  const [path, body] =
    w.kind === 'care'
      ? [`/api/sacs/${s.sacId}/log`, { kind: 'note', text: w.marker }]
      : [
          `/api/projects/${s.projectId}/entries`,
          { kind: 'money', date: todayIn('UTC', new Date()), fromMemberId: s.miraId, toMemberId: s.tomaszId, amountMinor: 100, note: w.marker },
        ];
  return fetch(`http://127.0.0.1:${port}${path}`, {
    method: 'POST',
    headers: { Authorization: s.mira.bearer, 'Content-Type': 'application/json', 'Idempotency-Key': w.key },
    body: JSON.stringify(body),
  });
}

const rows = <T>(sql: string, params: unknown[] = []) => t.orm.em.getConnection().execute<T[]>(sql, params);

beforeAll(async () => {
  if (!existsSync(main)) throw new Error(`No server build at ${main}: run "npm run build -w server" first.`);
  t = await createTestApp();
  s = await accountScenario(t.app, t.orm);
});
afterAll(async () => {
  child?.kill('SIGKILL');
  await t.close();
});

describe('a crash in the middle of writes loses no acknowledged write and leaves none half-written', () => {
  it('SIGKILL mid-burst, restart, then every acknowledged write is there and whole', async () => {
    const port = await freePort();
    child = await startServer(port);
    const writes: Write[] = [];
    let acked = 0;
    let killed = false;
    const worker = async (n: number) => {
      for (let i = 0; !killed; i++) {
        const w: Write = { kind: (n + i) % 2 ? 'care' : 'ledger', key: randomUUID(), marker: `crash-${n}-${i}-${randomUUID().slice(0, 8)}` };
        writes.push(w);
        try {
          const res = await send(port, w);
          if (!res.ok) throw new Error(`a write was refused: ${res.status} ${await res.text()}`);
          w.ackedId = ((await res.json()) as { id: string }).id;
          if (++acked === KILL_AFTER_ACKS) {
            killed = true;
            child!.kill('SIGKILL');
          }
        } catch (e) {
          if (!killed) throw e;
        }
      }
    };
    await Promise.all(Array.from({ length: WORKERS }, (_, n) => worker(n)));
    await new Promise((r) => (child!.exitCode !== null || child!.signalCode ? r(null) : child!.once('exit', r)));
    expect(child.signalCode).toBe('SIGKILL');
    const unanswered = writes.filter((w) => !w.ackedId);
    expect(unanswered.length, 'some writes were in flight when the server died').toBeGreaterThan(0);

    child = await startServer(port);

    // 1. Every acknowledged write is there, under the id the client was given.
    const care = await rows<{ id: string; text: string }>(`select id, text from sac_log_entries where sac_id = ? and text like 'crash-%'`, [s.sacId]);
    const ledger = await rows<{ id: string; note: string }>(`select id, note from ledger_entries where project_id = ? and note like 'crash-%'`, [s.projectId]);
    const stored = new Map([...care.map((r) => [r.text, r.id] as const), ...ledger.map((r) => [r.note, r.id] as const)]);
    for (const w of writes.filter((x) => x.ackedId)) expect(stored.get(w.marker), w.marker).toBe(w.ackedId);

    // 2. No half-written multi-step write: each entry has its one activity record, and no record lacks its entry.
    const careWithoutActivity = await rows(
      `select e.id from sac_log_entries e where e.sac_id = ? and (select count(*) from activity_events a where a.subject_type = 'sac' and a.data->>'entryId' = e.id::text) <> 1`,
      [s.sacId],
    );
    const activityWithoutCare = await rows(
      `select a.id from activity_events a where a.kind like 'care.%' and a.project_id = ? and not exists (select 1 from sac_log_entries e where e.id::text = a.data->>'entryId')`,
      [s.projectId],
    );
    const ledgerWithoutActivity = await rows(
      `select e.id from ledger_entries e where e.project_id = ? and (select count(*) from activity_events a where a.subject_type = 'ledger-entry' and a.subject_id = e.id) <> 1`,
      [s.projectId],
    );
    const activityWithoutLedger = await rows(
      `select a.id from activity_events a where a.subject_type = 'ledger-entry' and a.project_id = ? and not exists (select 1 from ledger_entries e where e.id = a.subject_id)`,
      [s.projectId],
    );
    expect({ careWithoutActivity, activityWithoutCare, ledgerWithoutActivity, activityWithoutLedger }).toEqual({
      careWithoutActivity: [],
      activityWithoutCare: [],
      ledgerWithoutActivity: [],
      activityWithoutLedger: [],
    });
    // Ledger sequence numbers stay unique (a gap from a rolled-back transaction is allowed: PostgreSQL sequences are not transactional).
    const [{ dupes }] = await rows<{ dupes: number }>(`select count(*) - count(distinct seq) as dupes from ledger_entries`);
    expect(Number(dupes)).toBe(0);

    // 3. A client retrying an unanswered write with its Idempotency-Key never gets it written twice.
    // (Today a key whose first request died mid-flight stays "in progress": the retry is refused with
    // 409 until the key expires, see docs/operations.md "Crash safety"; the write is then at most once.)
    const retried = await Promise.all(unanswered.map((w) => send(port, w)));
    for (const [i, res] of retried.entries()) expect([200, 201, 409], unanswered[i].marker).toContain(res.status);
    const markers = [
      ...(await rows<{ marker: string }>(`select text as marker from sac_log_entries where text like 'crash-%'`)),
      ...(await rows<{ marker: string }>(`select note as marker from ledger_entries where note like 'crash-%'`)),
    ].map((r) => r.marker);
    expect(markers.length, 'no write stored twice').toBe(new Set(markers).size);
    for (const [i, res] of retried.entries()) if (res.status < 300) expect(markers, unanswered[i].marker).toContain(unanswered[i].marker);
  }, 120_000);
});
