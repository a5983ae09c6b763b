// Speed of GET /api/revisions/:id/impact over 1,000 candidates: prints
// figures, asserts nothing. Run against a migrated and seeded database with
// the API's environment (DB_*, SESSION_SECRET), e.g. the test instance:
//   tsx bench/impact.ts [candidates=1000] [rounds=5]
import { forgetImpactMemo } from '../src/components/revisions/impact.js';
import { start, stop } from '../src/server.js';

const COUNT = Number(process.argv[2] ?? 1000);
const ROUNDS = Number(process.argv[3] ?? 5);

interface Reply {
  status: number;
  body: any;
}

let cookie = '';
let csrf = '';
let base = '';

async function call(method: string, path: string, body?: unknown): Promise<Reply> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (cookie) headers.cookie = cookie;
  if (csrf && method !== 'GET') headers['x-csrf-token'] = csrf;
  let payload: FormData | string | undefined;
  if (body instanceof FormData) payload = body;
  else if (body !== undefined) {
    headers['content-type'] = 'application/json';
    payload = JSON.stringify(body);
  }
  const res = await fetch(base + path, { method, headers, body: payload });
  const set = res.headers.getSetCookie()[0];
  if (set) cookie = set.split(';')[0]!;
  return { status: res.status, body: await res.json().catch(() => null) };
}

async function signIn(email: string): Promise<void> {
  cookie = '';
  const r = await call('POST', '/api/auth/login', { email, password: 'polecourt-demo' });
  if (r.status !== 200) throw new Error(`sign-in failed: ${r.status}`);
  csrf = r.body.csrfToken;
}

function must(r: Reply, status: number, what: string): any {
  if (r.status !== status) throw new Error(`${what}: ${r.status} ${JSON.stringify(r.body).slice(0, 300)}`);
  return r.body;
}

const running = await start({ PORT: '0', LOG_LEVEL: 'error', SMTP_PORT: '0' });
base = running.url;
try {
  const tag = `Bench ${Date.now().toString(36)}`;
  await signIn('systems@example.com');
  const line = must(await call('POST', '/api/product-lines', { name: tag, description: 'impact bench' }), 201, 'line');
  const set = must(await call('POST', `/api/product-lines/${line.id}/requirement-sets`, { name: 'Bench set', purpose: '' }), 201, 'set');
  const first = must(await call('POST', `/api/requirement-sets/${set.id}/revisions`, { requirements: { maxOvershootPct: 12, maxSettlingTime: 1.5, maxRiseTime: 0.5 } }), 201, 'rev 1');
  must(await call('POST', `/api/revisions/${first.id}/submit`), 200, 'submit');

  await signIn('controls@example.com');
  // Third- and fourth-order loops spread over damping 0.4..0.9, some with a zero
  // (DC gain is not exactly 1 for the fourth-order ones; it does not matter for timing).
  const rows = ['name,notes,gain,poles,zeros,numerator,denominator'];
  for (let i = 0; i < COUNT; i++) {
    const zeta = 0.4 + (0.5 * i) / COUNT;
    const wn = 4 + (i % 7);
    const re = -zeta * wn;
    const im = wn * Math.sqrt(1 - zeta * zeta);
    const far = -(20 + (i % 13) * 5);
    const withZero = i % 3 === 0;
    const zero = -(15 + (i % 5) * 4);
    const gain = (wn * wn * -far) / (withZero ? -zero : 1);
    rows.push(`loop ${i},,${gain.toPrecision(8)},${re.toPrecision(8)}±${im.toPrecision(8)}j ${far}${i % 4 === 0 ? ' -60' : ''},${withZero ? zero : ''},,`);
  }
  const form = new FormData();
  form.append('file', new Blob([rows.join('\n')]), 'bench.csv');
  let t = performance.now();
  const report = must(await call('POST', `/api/product-lines/${line.id}/candidates`, form), 201, 'upload');
  console.log(`upload of ${COUNT} CSV rows: ${(performance.now() - t).toFixed(0)} ms (${report.accepted.length} accepted, ${report.rejected.length} rejected)`);

  await signIn('admin@example.com');
  t = performance.now();
  must(await call('POST', `/api/revisions/${first.id}/approve`, { password: 'polecourt-demo', impactAcknowledged: true }), 200, 'approve');
  console.log(`approval of revision 1 (impact over ${COUNT} candidates, no baseline; includes the password check): ${(performance.now() - t).toFixed(0)} ms`);

  // The first impact call below is cold: no memo, and no stored assessments of these candidates.
  forgetImpactMemo();
  await signIn('systems@example.com');
  const proposal = must(await call('POST', `/api/requirement-sets/${set.id}/revisions`, { requirements: { maxOvershootPct: 8, maxSettlingTime: 1.2, maxRiseTime: 0.5 } }), 201, 'rev 2');
  const times: number[] = [];
  let changed = 0;
  for (let k = 0; k < ROUNDS; k++) {
    t = performance.now();
    const impact = must(await call('GET', `/api/revisions/${proposal.id}/impact`), 200, 'impact');
    times.push(performance.now() - t);
    changed = impact.changedCount;
  }
  const cold = times.shift()!;
  times.sort((a, b) => a - b);
  console.log(`GET impact, ${COUNT} candidates x 2 revisions (${changed} change verdict): first (cold) call ${cold.toFixed(0)} ms`);
  if (times.length) {
    console.log(`  repeated calls (${times.length}): min ${times[0]!.toFixed(0)} ms, median ${times[Math.floor(times.length / 2)]!.toFixed(0)} ms, max ${times[times.length - 1]!.toFixed(0)} ms`);
  }
} finally {
  await stop();
}
