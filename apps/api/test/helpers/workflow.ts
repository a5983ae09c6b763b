// Builders for the core-workflow tests: each makes its own product line,
// requirement set, revisions and candidates with unique names, so tests never
// depend on each other's rows in the shared database.
import { expect } from 'vitest';

import type { TestClient } from './client.js';

let counter = 0;
export function uniqueName(prefix: string): string {
  counter += 1;
  return `${prefix} ${Date.now().toString(36)}-${counter}`;
}

export interface Team {
  admin: TestClient;
  systems: TestClient;
  controls: TestClient;
  auditor: TestClient;
}

/** A closed-loop model with unity DC gain: a complex pair at re ± j·im and a real pole at p. */
export function thirdOrder(re: number, im: number, p: number): { poles: { re: number; im: number }[]; zeros: never[]; gain: number } {
  return { poles: [{ re, im }, { re, im: -im }, { re: p, im: 0 }], zeros: [], gain: (re * re + im * im) * -p };
}

export async function newLine(team: Team): Promise<{ id: number; name: string }> {
  const r = await team.systems.post('/api/product-lines', { name: uniqueName('Test line'), description: 'made by a test' });
  expect(r.status).toBe(201);
  return r.body;
}

export async function newSet(team: Team, lineId: number): Promise<{ id: number; name: string }> {
  const r = await team.systems.post(`/api/product-lines/${lineId}/requirement-sets`, { name: uniqueName('Set'), purpose: 'made by a test' });
  expect(r.status).toBe(201);
  return r.body;
}

export async function draft(team: Team, setId: number, requirements: Record<string, number>, rationale = 'test'): Promise<any> {
  const r = await team.systems.post(`/api/requirement-sets/${setId}/revisions`, { requirements, rationale });
  expect(r.status).toBe(201);
  return r.body;
}

/** Written and submitted by the systems engineer, approved by the admin. */
export async function approved(team: Team, setId: number, requirements: Record<string, number>): Promise<any> {
  const d = await draft(team, setId, requirements);
  expect((await team.systems.post(`/api/revisions/${d.id}/submit`)).status).toBe(200);
  const r = await team.admin.post(`/api/revisions/${d.id}/approve`, { password: 'polecourt-demo', impactAcknowledged: true });
  expect(r.status).toBe(200);
  return r.body;
}

export async function inReview(team: Team, setId: number, requirements: Record<string, number>): Promise<any> {
  const d = await draft(team, setId, requirements);
  const r = await team.systems.post(`/api/revisions/${d.id}/submit`);
  expect(r.status).toBe(200);
  return r.body;
}

export async function newCandidate(team: Team, lineId: number, design: unknown, name = uniqueName('Candidate')): Promise<any> {
  const r = await team.controls.post(`/api/product-lines/${lineId}/candidates`, { name, notes: '', design });
  expect(r.status).toBe(201);
  return r.body;
}
