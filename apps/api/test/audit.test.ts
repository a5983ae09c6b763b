import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { TestClient, signedIn } from './helpers/client.js';
import { startTestServer, stopTestServer, uniqueEmail } from './helpers/server.js';

let url: string;
let sequelize: Awaited<ReturnType<typeof startTestServer>>['sequelize'];
beforeAll(async () => {
  const running = await startTestServer();
  url = running.url;
  sequelize = running.sequelize;
});
afterAll(stopTestServer);

describe('GET /api/audit-events/verify', () => {
  it('When nothing was tampered with, then the chain is intact', async () => {
    const auditor = await signedIn(url, 'auditor');
    const r = await auditor.get('/api/audit-events/verify');
    expect(r.status).toBe(200);
    expect(r.body.intact).toBe(true);
    expect(r.body.checked).toBeGreaterThan(0);
  });

  it('When one event is edited directly in the database, then the check names that event; undoing the edit makes it intact again', async () => {
    const admin = await signedIn(url, 'admin');
    const created = await admin.post('/api/users', { email: uniqueEmail(), name: 'Chain Test', role: 'auditor', password: 'a-long-test-password' });
    const events = await admin.get(`/api/audit-events?entityType=user&entityId=${created.body.id}`);
    const target = events.body.items[0];
    const [[row]] = (await sequelize.query(`SELECT after_json FROM audit_events WHERE id = ${Number(target.id)}`)) as [[{ after_json: string }], unknown];
    await sequelize.query(`UPDATE audit_events SET after_json = REPLACE(after_json, 'Chain Test', 'Chain Edit') WHERE id = ${Number(target.id)}`);
    try {
      const r = await admin.get('/api/audit-events/verify');
      expect(r.body.intact).toBe(false);
      expect(r.body.firstBreak.id).toBe(target.id);
    } finally {
      await sequelize.query('UPDATE audit_events SET after_json = ? WHERE id = ?', { replacements: [row.after_json, Number(target.id)] });
    }
    expect((await admin.get('/api/audit-events/verify')).body.intact).toBe(true);
  });

  it.each(['systems_engineer', 'controls_engineer'] as const)('When a %s reads the audit trail, then 403', async (role) => {
    const c = await signedIn(url, role);
    expect((await c.get('/api/audit-events')).status).toBe(403);
  });

  it('When signed out, then 401', async () => {
    expect((await new TestClient(url).get('/api/audit-events')).status).toBe(401);
  });
});
