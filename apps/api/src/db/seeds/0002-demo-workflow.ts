import type { Transaction } from 'sequelize';

import { ENGINE_VERSION, evaluate } from '@polecourt/spec';

import { assessmentRepository } from '../../components/assessments/repository.js';
import { recordAudit } from '../../components/audit/record-audit.js';
import { candidateRepository } from '../../components/candidates/repository.js';
import { productLineRepository } from '../../components/product-lines/repository.js';
import { requirementSetRepository } from '../../components/requirement-sets/repository.js';
import { acknowledgement, computeImpact } from '../../components/revisions/impact.js';
import { revisionRepository } from '../../components/revisions/repository.js';
import { requirementsSha256 } from '../../components/revisions/requirements-sha256.js';
import { userRepository } from '../../components/users/repository.js';
import type { SessionUser } from '../../lib/request-context.js';

// Tarnwell Motion Works' requirement sets and candidate loops (invented
// numbers). Per product line: revision 1 approved (written by the systems
// engineer, approved by the administrator), revision 2 in review, a few
// candidates each assessed once against revision 1. `story` is what the
// engine must say about each candidate; test/demo-seed.test.ts checks it.

export type DemoStory =
  /** compliant against the approved revision */
  | 'compliant'
  /** not compliant, and the second-order view already says so */
  | 'noncompliant'
  /** dominant pair inside the admissible region, second-order estimate compliant, exact response fails: dominance weak */
  | 'dominance_weak';

export interface DemoCandidate {
  name: string;
  notes: string;
  design: Record<string, unknown>;
  story: DemoStory;
  /** The verdict against the revision in review. */
  inReview: 'compliant' | 'noncompliant';
}

export interface DemoLine {
  productLine: string;
  set: { name: string; purpose: string };
  approved: { requirements: Record<string, number>; rationale: string };
  inReview: { requirements: Record<string, number>; rationale: string };
  candidates: DemoCandidate[];
}

const pair = (re: number, im: number) => [
  { re, im },
  { re, im: -im },
];
const real = (re: number) => ({ re, im: 0 });

export const DEMO_WORKFLOW: DemoLine[] = [
  {
    productLine: 'TG-4 gimbal pitch axis',
    set: { name: 'Pitch step response', purpose: 'Small-angle pointing steps of the pitch axis with the standard camera payload.' },
    approved: {
      requirements: { maxOvershootPct: 12, maxSettlingTime: 0.3, settlingBandPct: 2, maxRiseTime: 0.08 },
      rationale: 'Baseline from the TG-3 field returns: footage judders when a pointing step overshoots more than about 12 %.',
    },
    inReview: {
      requirements: { maxOvershootPct: 8, maxSettlingTime: 0.25, settlingBandPct: 2, maxRiseTime: 0.08 },
      rationale: 'The long-lens payload option needs a calmer step: overshoot down to 8 %, settling 50 ms sooner.',
    },
    candidates: [
      { name: 'TG-4 pitch, PID v3 (notch)', notes: 'Rate loop with a notch at the arm resonance; fast real pole from the current loop.', design: { poles: [...pair(-21, 21.424), real(-200)], zeros: [], gain: 180000 }, story: 'compliant', inReview: 'compliant' },
      { name: 'TG-4 pitch, PI v2 (soft)', notes: 'Lower integral gain for the lightweight payload.', design: { poles: [...pair(-11.25, 22.326), real(-150)], zeros: [], gain: 93750 }, story: 'noncompliant', inReview: 'noncompliant' },
      { name: 'TG-4 pitch, PID v4 (lag pole)', notes: 'Added a filter pole at 26 rad/s against encoder noise.', design: { poles: [...pair(-21, 21.424), real(-26)], zeros: [], gain: 23400 }, story: 'dominance_weak', inReview: 'noncompliant' },
      { name: 'TG-4 pitch, PD v1 (lead zero)', notes: 'Derivative on error puts a zero at -24 rad/s, right beside the pair.', design: { poles: [...pair(-18.6, 23.538), real(-220)], zeros: [real(-24)], gain: 8250 }, story: 'dominance_weak', inReview: 'noncompliant' },
      { name: 'TG-4 pitch, PID v3b (brisk)', notes: 'v3 with 10 % more proportional gain.', design: { poles: [...pair(-19.2, 25.6), real(-250)], zeros: [], gain: 256000 }, story: 'compliant', inReview: 'noncompliant' },
    ],
  },
  {
    productLine: 'VP-20 valve positioner',
    set: { name: 'Stem position step', purpose: 'A 10 % stroke step of the stem position at nominal supply pressure.' },
    approved: {
      requirements: { maxOvershootPct: 5, maxSettlingTime: 2, settlingBandPct: 2 },
      rationale: 'Process customers accept at most 5 % stem overshoot; 2 s settling matches the VP-12 datasheet.',
    },
    inReview: {
      requirements: { maxOvershootPct: 5, maxSettlingTime: 1.6, settlingBandPct: 2, minDampingRatio: 0.7 },
      rationale: 'Faster settling for the steam-line variant, and a damping floor so supply-pressure drift does not ring.',
    },
    candidates: [
      { name: 'VP-20 stem, PI-D v1', notes: 'Pneumatic relay pole near 30 rad/s.', design: { poles: [...pair(-3, 2.6458), real(-30)], zeros: [], gain: 480 }, story: 'compliant', inReview: 'compliant' },
      { name: 'VP-20 stem, PI v3 (conservative)', notes: 'Detuned for sticky packings.', design: { poles: [...pair(-2.4, 1.8), real(-25)], zeros: [], gain: 225 }, story: 'compliant', inReview: 'compliant' },
      { name: 'VP-20 stem, P v2 (fast)', notes: 'Proportional only, high gain.', design: { poles: [...pair(-3, 4), real(-40)], zeros: [], gain: 1000 }, story: 'noncompliant', inReview: 'noncompliant' },
      { name: 'VP-20 stem, bench fit (coefficients)', notes: 'Fitted from the bench step test, entered as polynomial coefficients.', design: { numerator: [480], denominator: [1, 14, 64, 480] }, story: 'noncompliant', inReview: 'noncompliant' },
    ],
  },
  {
    productLine: 'SD-7 spindle drive',
    set: { name: 'Speed loop step', purpose: 'A 500 rpm speed step of the unloaded spindle.' },
    approved: {
      requirements: { maxOvershootPct: 15, maxSettlingTime: 0.08, minDampingRatio: 0.5, maxNaturalFrequency: 400 },
      rationale: 'Keeps torque peaks inside the inverter rating; the ceiling keeps the loop clear of the first shaft mode.',
    },
    inReview: {
      requirements: { maxOvershootPct: 15, maxSettlingTime: 0.08, minDampingRatio: 0.5, maxNaturalFrequency: 300, marginPct: 5 },
      rationale: 'The longer tool holder moved the shaft mode down: ceiling to 300 rad/s, with a 5 % guard band.',
    },
    candidates: [
      { name: 'SD-7 speed, PI v5', notes: 'Standard tuning, current loop pole at 900 rad/s.', design: { poles: [...pair(-72, 96), real(-900)], zeros: [], gain: 12960000 }, story: 'compliant', inReview: 'compliant' },
      { name: 'SD-7 speed, PI v6 (high bandwidth)', notes: 'For the light spindle option.', design: { poles: [...pair(-192.5, 292.31), real(-3000)], zeros: [], gain: 367500000 }, story: 'compliant', inReview: 'noncompliant' },
      { name: 'SD-7 speed, PI v5 + speed filter', notes: 'v5 with a speed-feedback filter pole at 95 rad/s.', design: { poles: [...pair(-72, 96), real(-95)], zeros: [], gain: 1368000 }, story: 'compliant', inReview: 'compliant' },
    ],
  },
];

const actorOf = (u: { id: number; email: string; name: string; role: SessionUser['role'] }): SessionUser => ({ id: u.id, email: u.email, name: u.name, role: u.role });

export async function up(t: Transaction): Promise<void> {
  const find = async (email: string) => {
    const u = await userRepository.findByEmail(email);
    if (!u) throw new Error(`seed 0002 needs the demo user ${email} from seed 0001`);
    return actorOf(u);
  };
  const admin = await find('admin@example.com');
  const systems = await find('systems@example.com');
  const controls = await find('controls@example.com');

  for (const demo of DEMO_WORKFLOW) {
    const line = await productLineRepository.findByName(demo.productLine, t);
    if (!line) throw new Error(`seed 0002 needs the product line ${demo.productLine} from seed 0001`);
    const audit = (actor: SessionUser, action: string, entityType: string, entityId: number, before: unknown, after: unknown) =>
      recordAudit(t, actor, { action, entityType, entityId, productLineId: line.id, before, after });

    const set = await requirementSetRepository.create({ productLineId: line.id, name: demo.set.name, purpose: demo.set.purpose, createdBy: systems.id }, t);
    await audit(systems, 'requirement_set.create', 'requirement_set', set.id, null, set);

    const candidates = [];
    for (const c of demo.candidates) {
      const saved = await candidateRepository.create({ productLineId: line.id, name: c.name, notes: c.notes, design: c.design, createdBy: controls.id }, t);
      await audit(controls, 'candidate.create', 'candidate', saved.id, null, saved);
      candidates.push(saved);
    }

    // Revision 1: written, submitted, approved by someone else.
    const draft = await revisionRepository.create({ requirementSetId: set.id, number: 1, requirements: demo.approved.requirements, rationale: demo.approved.rationale, authorId: systems.id }, t);
    await audit(systems, 'revision.create', 'revision', draft.id, null, draft);
    const submitted = await revisionRepository.update(draft.id, { status: 'in_review', submittedAt: new Date(), version: draft.version + 1 }, t);
    await audit(systems, 'revision.submit', 'revision', draft.id, draft, submitted);
    const now = new Date();
    const impact = await computeImpact(submitted, line.id, null, t);
    const approved = await revisionRepository.update(
      draft.id,
      {
        status: 'approved',
        approverId: admin.id,
        approvedAt: now,
        sha256: requirementsSha256(submitted.requirements),
        approvalMeaning: 'approved',
        impact: acknowledgement(impact, now),
        version: submitted.version + 1,
      },
      t,
    );
    await audit(admin, 'revision.approve', 'revision', draft.id, submitted, approved);

    // Revision 2: in review.
    const second = await revisionRepository.create({ requirementSetId: set.id, number: 2, requirements: demo.inReview.requirements, rationale: demo.inReview.rationale, authorId: systems.id }, t);
    await audit(systems, 'revision.create', 'revision', second.id, null, second);
    const secondSubmitted = await revisionRepository.update(second.id, { status: 'in_review', submittedAt: new Date(), version: second.version + 1 }, t);
    await audit(systems, 'revision.submit', 'revision', second.id, second, secondSubmitted);

    // One assessment per candidate against the approved revision.
    for (const c of candidates) {
      const result = evaluate(c.design, approved.requirements);
      const stored = {
        candidateId: c.id,
        revisionId: approved.id,
        revisionSha256: approved.sha256!,
        engineVersion: result.engineVersion ?? ENGINE_VERSION,
        verdict: result.verdict ?? 'noncompliant',
        result,
        createdBy: controls.id,
      };
      const id = await assessmentRepository.create(stored, t);
      await audit(controls, 'assessment.create', 'assessment', id, null, { id, ...stored });
    }
  }
}
