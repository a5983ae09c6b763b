import nodemailer from 'nodemailer';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { notifyAssessmentNotCompliant } from '../src/components/mail/notify-assessment-not-compliant.js';
import { notifyReportIssued } from '../src/components/mail/notify-report-issued.js';
import { notifyRevisionApproved } from '../src/components/mail/notify-revision-approved.js';
import { notifyRevisionSubmitted } from '../src/components/mail/notify-revision-submitted.js';
import { inTransaction } from '../src/lib/transaction.js';
import type { Running } from '../src/server.js';
import { DEMO, TestClient, signedIn } from './helpers/client.js';
import { queueRowsFor, setPasswordLink, waitForMail } from './helpers/mail.js';
import { startTestServer, stopTestServer, uniqueEmail } from './helpers/server.js';

let running: Running;
let url: string;
let admin: TestClient;
beforeAll(async () => {
  running = await startTestServer();
  url = running.url;
  admin = await signedIn(url, 'admin');
});
afterAll(stopTestServer);

const NOT_ADMIN = ['systems_engineer', 'controls_engineer', 'auditor'] as const;

describe('the local mail fake', () => {
  it('When a message is sent to it over SMTP, then the outbox shows it parsed, with both bodies', async () => {
    expect(running.mailFake).not.toBeNull();
    const to = uniqueEmail('fake');
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port: running.mailFake!.port, secure: false, ignoreTLS: true });
    try {
      await transport.sendMail({ from: 'someone@test.example.com', to, subject: 'Fake check ✓', text: 'plain body', html: '<p>html body</p>' });
    } finally {
      transport.close();
    }
    const [message] = await waitForMail(admin, to);
    expect(message).toMatchObject({ to, subject: 'Fake check ✓' });
    expect(message!.text.trim()).toBe('plain body');
    expect(message!.html).toContain('<p>html body</p>');
    expect(message!.messageId).toMatch(/@/);
    expect(Number.isNaN(Date.parse(message!.sentAt))).toBe(false);
  });
});

describe('POST /api/users sends an invitation', () => {
  it('When the admin creates an account without a password, then an invitation with a one-time link reaches the person', async () => {
    const email = uniqueEmail('invitee');
    const r = await admin.post('/api/users', { email, name: 'Ada Invitee', role: 'controls_engineer' });
    expect(r.status).toBe(201);
    const [message] = await waitForMail(admin, email);
    expect(message!.to).toBe(email);
    expect(message!.subject).toBe('Your Polecourt account: set your password');
    expect(message!.text).toContain('Hello Ada Invitee,');
    expect(message!.text).toContain('Ines Okafor'); // the demo admin who invited
    expect(message!.text).toContain('Controls engineer');
    const { url: link, token } = setPasswordLink(message!);
    expect(link.origin + link.pathname).toBe(`${url}/set-password`);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/); // 32 random bytes, base64url
    expect(message!.html).toContain(`href="${url}/set-password?token=${token}"`);
    // The account exists but cannot sign in yet.
    expect((await new TestClient(url).login(email, 'anything-long-enough')).status).toBe(401);
  });

  it('When the admin gives a password, then the account can sign in at once and no invitation is queued', async () => {
    const email = uniqueEmail('scripted');
    const r = await admin.post('/api/users', { email, name: 'Scripted Person', role: 'auditor', password: 'a-long-test-password' });
    expect(r.status).toBe(201);
    expect((await new TestClient(url).login(email, 'a-long-test-password')).status).toBe(200);
    expect(await queueRowsFor(running.sequelize, email)).toEqual([]);
  });

  it('When the account cannot be saved (e-mail taken), then no message is queued', async () => {
    const before = (await queueRowsFor(running.sequelize, DEMO.auditor)).length;
    const r = await admin.post('/api/users', { email: DEMO.auditor, name: 'Twin', role: 'auditor' });
    expect(r.status).toBe(409);
    expect((await queueRowsFor(running.sequelize, DEMO.auditor)).length).toBe(before);
  });
});

describe('workflow messages', () => {
  it('notifyRevisionSubmitted(t, ...) sends one "review requested" message per systems engineer, none to the author', async () => {
    const a = uniqueEmail('se-a');
    const b = uniqueEmail('se-b');
    const author = uniqueEmail('se-author');
    const queued = await inTransaction((t) =>
      notifyRevisionSubmitted(t, {
        productLineName: 'VP-20 valve positioner',
        requirementSetName: 'Stem position step',
        revisionNumber: 3,
        authorName: 'Pavel Lindqvist',
        authorEmail: author,
        link: '/product-lines/2/requirement-sets/7',
        recipients: [
          { email: a, name: 'Engineer A' },
          { email: b.toUpperCase(), name: 'Engineer B' },
          { email: b, name: 'Engineer B again' },
          { email: author, name: 'The author' },
        ],
      }),
    );
    expect(queued).toHaveLength(2);
    for (const [to, name] of [[a, 'Engineer A'], [b, 'Engineer B']] as const) {
      const [message] = await waitForMail(admin, to);
      expect(message!.subject).toBe('Review requested: Stem position step, revision 3');
      expect(message!.text).toContain(`Hello ${name},`);
      expect(message!.text).toContain('Pavel Lindqvist has submitted revision 3 of the requirement set "Stem position step" (product line VP-20 valve positioner)');
      expect(message!.text).toContain(`${url}/product-lines/2/requirement-sets/7`);
      expect(message!.html).toContain(`href="${url}/product-lines/2/requirement-sets/7"`);
    }
    expect(await queueRowsFor(running.sequelize, author)).toEqual([]);
  });

  it('notifyRevisionApproved(t, ...) tells owners which verdicts flip and the other engineers that it is approved', async () => {
    const owner = uniqueEmail('owner');
    const engineer = uniqueEmail('engineer');
    await inTransaction((t) =>
      notifyRevisionApproved(t, {
        productLineName: 'TG-4 gimbal pitch axis',
        requirementSetName: 'Pitch step response',
        revisionNumber: 2,
        approverName: 'Pavel Lindqvist',
        sha256: 'a'.repeat(64),
        link: '/revisions/11',
        engineers: [
          { email: engineer, name: 'Plain Engineer' },
          { email: owner, name: 'Owner Engineer' },
        ],
        verdictChanges: [
          { candidateName: 'Pitch loop v4', owner: { email: owner, name: 'Owner Engineer' }, before: 'compliant', after: 'not_compliant', link: '/candidates/40' },
          { candidateName: 'Pitch loop v5', owner: { email: owner, name: 'Owner Engineer' }, before: 'not_compliant', after: 'compliant' },
        ],
      }),
    );
    const [toOwner] = await waitForMail(admin, owner);
    expect(toOwner!.subject).toBe('Approved: Pitch step response, revision 2 (verdict changed)');
    expect(toOwner!.text).toContain('It changes the verdict of 2 of your candidates:');
    expect(toOwner!.text).toContain(`- Pitch loop v4: compliant -> not compliant (${url}/candidates/40)`);
    expect(toOwner!.text).toContain('- Pitch loop v5: not compliant -> compliant');
    expect(toOwner!.text).toContain(`Content SHA-256: ${'a'.repeat(64)}`);
    const [toEngineer] = await waitForMail(admin, engineer);
    expect(toEngineer!.subject).toBe('Approved: Pitch step response, revision 2');
    expect(toEngineer!.text).toContain(`${url}/revisions/11`);
    expect(toEngineer!.text).not.toContain('Pitch loop v4');
    // The owner is also an engineer of the line, and still gets exactly one message.
    expect(await queueRowsFor(running.sequelize, owner)).toHaveLength(1);
  });

  it('notifyAssessmentNotCompliant(t, ...) tells the submitter which limits were missed', async () => {
    const submitter = uniqueEmail('submitter');
    await inTransaction((t) =>
      notifyAssessmentNotCompliant(t, {
        to: { email: submitter, name: 'Mara Ettinger' },
        candidateName: 'Spindle PI <fast>',
        productLineName: 'SD-7 spindle drive',
        requirementSetName: 'Speed step',
        revisionNumber: 1,
        failedLimits: ['settling time (2 % band): 0.41 s, limit 0.30 s', 'percent overshoot: 14 %, limit 10 %'],
        link: `${url}/assessments/9`,
      }),
    );
    const [message] = await waitForMail(admin, submitter);
    expect(message!.subject).toBe('Not compliant: Spindle PI <fast> against Speed step, revision 1');
    expect(message!.text).toContain('has the verdict: not compliant');
    expect(message!.text).toContain('- settling time (2 % band): 0.41 s, limit 0.30 s');
    expect(message!.text).toContain('- percent overshoot: 14 %, limit 10 %');
    expect(message!.text).toContain(`${url}/assessments/9`);
    // Names are escaped in the HTML body, never markup.
    expect(message!.html).toContain('Spindle PI &lt;fast&gt;');
    expect(message!.html).not.toContain('<fast>');
  });

  it('notifyReportIssued(t, ...) sends the auditors the report number, meaning and PDF hash', async () => {
    const auditors = [uniqueEmail('auditor-a'), uniqueEmail('auditor-b')];
    const sha = 'b'.repeat(64);
    const queued = await inTransaction((t) =>
      notifyReportIssued(t, {
        reportNumber: 'CR-2025-0007',
        meaning: 'released',
        signerName: 'Mara Ettinger',
        candidateName: 'Valve loop B',
        productLineName: 'VP-20 valve positioner',
        requirementSetName: 'Stem position step',
        revisionNumber: 3,
        verdict: 'compliant',
        sha256: sha,
        link: '/reports/7',
        recipients: auditors.map((email) => ({ email, name: 'Auditor' })),
      }),
    );
    expect(queued).toHaveLength(2);
    for (const to of auditors) {
      const [message] = await waitForMail(admin, to);
      expect(message!.subject).toBe('Compliance report CR-2025-0007 issued: Valve loop B');
      expect(message!.text).toContain('with the meaning "released"');
      expect(message!.text).toContain('verdict: compliant');
      expect(message!.text).toContain(sha);
      expect(message!.text).toContain(`${url}/reports/7`);
      expect(message!.text).toContain('not a safety case');
    }
  });

  it('When the transaction that queued a message rolls back, then the message does not exist', async () => {
    const to = uniqueEmail('rolled-back');
    await expect(
      inTransaction(async (t) => {
        await notifyAssessmentNotCompliant(t, {
          to: { email: to, name: 'Nobody' },
          candidateName: 'X',
          productLineName: 'Y',
          requirementSetName: 'Z',
          revisionNumber: 1,
          failedLimits: [],
          link: '/',
        });
        throw new Error('the cause was not saved');
      }),
    ).rejects.toThrow('the cause was not saved');
    expect(await queueRowsFor(running.sequelize, to)).toEqual([]);
  });
});

describe('GET /api/outbox', () => {
  it('When the admin reads it, then messages come newest first with to, subject, text and sentAt, paged with a total', async () => {
    const first = uniqueEmail('order');
    const second = uniqueEmail('order');
    await admin.post('/api/users', { email: first, name: 'First', role: 'auditor' });
    const [older] = await waitForMail(admin, first);
    await admin.post('/api/users', { email: second, name: 'Second', role: 'auditor' });
    const [newer] = await waitForMail(admin, second);
    const r = await admin.get('/api/outbox?limit=50&offset=0');
    expect(r.status).toBe(200);
    expect(r.body.total).toBeGreaterThanOrEqual(2);
    const ids: number[] = r.body.items.map((m: { id: number }) => m.id);
    expect(ids).toEqual([...ids].sort((x, y) => y - x));
    expect(ids.indexOf(newer!.id)).toBeLessThan(ids.indexOf(older!.id));
    expect(ids.indexOf(older!.id)).toBeGreaterThanOrEqual(0);
    for (const m of r.body.items) {
      expect(Object.keys(m)).toEqual(expect.arrayContaining(['id', 'to', 'subject', 'text', 'sentAt']));
    }
    const page = await admin.get('/api/outbox?limit=1&offset=1');
    expect(page.body.items).toHaveLength(1);
    expect(page.body.items[0].id).toBeLessThan(ids[0]!);
  });

  it.each(NOT_ADMIN)('When a %s reads it, then 403', async (role) => {
    const c = await signedIn(url, role);
    const r = await c.get('/api/outbox');
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('forbidden');
  });

  it('When signed out, then 401', async () => {
    expect((await new TestClient(url).get('/api/outbox')).status).toBe(401);
  });

  it('When limit is not a number, then 400 names limit', async () => {
    const r = await admin.get('/api/outbox?limit=many');
    expect(r.status).toBe(400);
    expect(r.body.error.fields).toHaveProperty('limit');
  });
});
