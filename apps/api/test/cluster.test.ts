// API_PROCESSES=2: the parent runs the mail fake, the mail sender and the
// object-storage fake once; two forked HTTP processes share the port. What a
// user relies on must work the same as with one process.
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';

import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { signedIn, TestClient } from './helpers/client.js';
import { uniqueEmail } from './helpers/server.js';
import { approved, newCandidate, newLine, newSet, thirdOrder, type Team } from './helpers/workflow.js';

const apiDir = path.resolve(import.meta.dirname, '..');
let parent: ChildProcess;
let url: string;
let log = '';
let team: Team;

function children(): number[] {
  try {
    return execFileSync('ps', ['-o', 'pid=', '--ppid', String(parent.pid)], { encoding: 'utf8' })
      .split('\n')
      .map((l) => Number(l.trim()))
      .filter((n) => n > 0);
  } catch {
    return []; // ps exits 1 when there are none
  }
}

async function until<T>(what: string, probe: () => Promise<T | undefined> | T | undefined, ms = 20_000): Promise<T> {
  const deadline = Date.now() + ms;
  for (;;) {
    const v = await probe();
    if (v !== undefined) return v;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}; the API printed:\n${log}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

beforeAll(async () => {
  parent = spawn(process.execPath, ['--import', 'tsx', 'src/main.ts'], {
    cwd: apiDir,
    // A mail poll of 10 minutes: mail that arrives within seconds was sent on the HTTP process's kick.
    env: { ...process.env, API_PROCESSES: '2', PORT: '0', SMTP_PORT: '0', S3_PORT: '0', LOG_LEVEL: 'info', NODE_ENV: 'test', MAIL_POLL_MS: '600000', LOGIN_MAX_FAILURES_PER_ADDRESS: '100000' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  parent.stdout!.on('data', (d: Buffer) => (log += d.toString()));
  parent.stderr!.on('data', (d: Buffer) => (log += d.toString()));
  url = await until('serving on', () => /serving on (http:\/\/\S+)/.exec(log)?.[1], 60_000);
  team = {
    admin: await signedIn(url, 'admin'),
    systems: await signedIn(url, 'systems_engineer'),
    controls: await signedIn(url, 'controls_engineer'),
    auditor: await signedIn(url, 'auditor'),
  };
}, 90_000);

afterAll(() => {
  if (parent.exitCode === null) parent.kill('SIGKILL');
});

describe('API_PROCESSES=2', () => {
  it('When started, then two HTTP processes run under the parent and answer', async () => {
    expect(children()).toHaveLength(2);
    expect((await new TestClient(url).get('/api/health')).body).toEqual({ ok: true, db: 'up' });
  });

  it('When a request queues mail, then the parent sends it at once (woken by the HTTP process, not by its 10-minute poll)', async () => {
    const email = uniqueEmail('cluster');
    expect((await team.admin.post('/api/users', { email, name: 'Cluster Person', role: 'auditor', password: 'a-long-test-password' })).status).toBe(201);
    const before = (await team.admin.get('/api/outbox')).body.total as number;
    expect((await new TestClient(url).post('/api/auth/request-reset', { email })).status).toBe(202);
    const total = await until('the mail in the outbox', async () => {
      const t = (await team.admin.get('/api/outbox')).body.total as number;
      return t > before ? t : undefined;
    }, 10_000);
    expect(total).toBe(before + 1);
    expect((await team.admin.get('/api/outbox')).body.items[0]).toMatchObject({ to: email, subject: 'Reset your Polecourt password' });
  });

  it('When a report is signed in an HTTP process, then it is archived in the parent’s object-storage fake and downloads as a PDF', async () => {
    const line = await newLine(team);
    const set = await newSet(team, line.id);
    await approved(team, set.id, { maxOvershootPct: 10, maxSettlingTime: 2 });
    const candidate = await newCandidate(team, line.id, thirdOrder(-3, 4, -40));
    const assessment = await team.controls.post(`/api/candidates/${candidate.id}/assessments`, {});
    expect(assessment.status).toBe(201);
    const report = await team.controls.post(`/api/assessments/${assessment.body.id}/reports`, { password: 'polecourt-demo', meaning: 'released' });
    expect(report.status).toBe(201);
    const res = await fetch(`${url}/api/reports/${report.body.id}/pdf`, { headers: { cookie: team.auditor.cookieHeader } });
    expect(res.status).toBe(200);
    expect(Buffer.from(await res.arrayBuffer()).subarray(0, 5).toString()).toBe('%PDF-');
  });

  it('When an HTTP process is killed, then the parent starts another, and the session cookie still works', async () => {
    const [victim] = children();
    process.kill(victim!, 'SIGKILL');
    await until('a new HTTP process', () => {
      const now = children();
      return now.length === 2 && !now.includes(victim!) ? now : undefined;
    });
    expect(log).toMatch(new RegExp(`API process ${victim} ended \\(SIGKILL\\); starting another`));
    // Fresh connections (a kept-alive one to the killed process is gone).
    const again = new TestClient(url);
    (again as unknown as { cookies: Map<string, string> }).cookies = new Map([['polecourt.sid', team.auditor.cookieHeader.split('=').slice(1).join('=')]]);
    for (let i = 0; i < 10; i++) expect((await again.get('/api/auth/me')).status).toBe(200);
  });

  it('When the parent gets SIGTERM, then every process stops and the parent exits 0', async () => {
    const kids = children();
    const exited = new Promise<number | null>((resolve) => parent.once('exit', (code) => resolve(code)));
    parent.kill('SIGTERM');
    expect(await exited).toBe(0);
    for (const pid of kids) expect(() => process.kill(pid, 0)).toThrow();
  }, 30_000);
});
