import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { evaluate } from '@polecourt/spec';

import { DEMO_WORKFLOW } from '../src/db/seeds/0002-demo-workflow.js';
import { signedIn, type TestClient } from './helpers/client.js';
import { startTestServer, stopTestServer } from './helpers/server.js';

// A test of the demo seed: each invented candidate gets the verdict its story
// says from the engine, and the seeded database shows the workflow populated.

describe('the demo workflow seed, checked with the engine', () => {
  const all = DEMO_WORKFLOW.flatMap((line) => line.candidates.map((c) => ({ line, c })));

  it.each(all.map(({ line, c }) => [c.name, line, c] as const))('%s gets the verdict its story says', (_name, line, c) => {
    const now = evaluate(c.design, line.approved.requirements);
    const next = evaluate(c.design, line.inReview.requirements);
    expect(next.verdict).toBe(c.inReview);
    if (c.story === 'compliant') {
      expect(now.verdict).toBe('compliant');
    } else if (c.story === 'noncompliant') {
      expect(now.verdict).toBe('noncompliant');
    } else {
      // Dominance weak: the pair sits in the region and the second-order
      // estimate meets every limit, but the exact response fails one.
      expect(now.regionPass).toBe(true);
      expect(now.dominant?.approximationValid).toBe(false);
      for (const check of now.checks) {
        const est = check.estimate;
        expect(est, check.requirement).not.toBeNull();
        const limit = check.effectiveLimit ?? check.limit;
        expect(check.requirement === 'minDampingRatio' ? est! >= limit : est! <= limit, check.requirement).toBe(true);
      }
      expect(now.verdict).toBe('noncompliant');
    }
  });

  it('When taken together, the demo shows a compliant, a not compliant and a dominance-weak candidate, and a revision in review that changes some verdicts', () => {
    const stories = new Set(all.map(({ c }) => c.story));
    expect([...stories].sort()).toEqual(['compliant', 'dominance_weak', 'noncompliant']);
    const changes = all.filter(({ line, c }) => evaluate(c.design, line.approved.requirements).verdict !== c.inReview);
    expect(changes.length).toBeGreaterThan(0);
    for (const line of DEMO_WORKFLOW) expect(line.candidates.length).toBeGreaterThanOrEqual(3);
  });
});

describe('the seeded database', () => {
  let reader: TestClient;
  beforeAll(async () => {
    const { url } = await startTestServer();
    reader = await signedIn(url, 'auditor');
  });
  afterAll(stopTestServer);

  it('When the demo is seeded, then each line has an approved revision by another person, one in review, and every candidate assessed once against the approved one', async () => {
    const lines = (await reader.get('/api/product-lines?limit=500')).body.items as { id: number; name: string }[];
    for (const demo of DEMO_WORKFLOW) {
      const line = lines.find((l) => l.name === demo.productLine)!;
      const sets = (await reader.get(`/api/product-lines/${line.id}/requirement-sets`)).body.items;
      const set = (await reader.get(`/api/requirement-sets/${sets.find((s: { name: string }) => s.name === demo.set.name).id}`)).body;
      const byNumber = Object.fromEntries(set.revisions.map((r: { number: number }) => [r.number, r]));
      expect(byNumber[1]).toMatchObject({ status: 'approved', requirements: demo.approved.requirements, approvalMeaning: 'approved' });
      expect(byNumber[1].approver.id).not.toBe(byNumber[1].author.id);
      expect(byNumber[1].sha256).toMatch(/^[0-9a-f]{64}$/);
      expect(byNumber[2]).toMatchObject({ status: 'in_review', requirements: demo.inReview.requirements });
      const coverage = (await reader.get(`/api/product-lines/${line.id}/coverage`)).body.items as { candidateName: string; status: string; revisionId: number }[];
      for (const c of demo.candidates) {
        const row = coverage.find((x) => x.candidateName === c.name)!;
        expect(row.revisionId).toBe(byNumber[1].id);
        expect(row.status).toBe(c.story === 'compliant' ? 'compliant' : 'noncompliant');
      }
    }
  });
});
