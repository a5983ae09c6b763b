import { ENGINE_VERSION, evaluate } from '@polecourt/spec';

import type { ReportContent } from '../src/components/reports/report-content.js';
import { reportFigures } from '../src/components/reports/report-figures.js';

// A report's content without a database: an invented servo candidate of the
// invented demo company against an invented requirement revision. Used by
// the benchmark and for looking at the layout.
export function sampleReportContent(signing: { subject: string; certificateSha256: string }): ReportContent {
  const design = { poles: [{ re: -2, im: 3 }, { re: -2, im: -3 }, { re: -15, im: 0 }], zeros: [], gain: 195 };
  const requirements = { maxOvershootPct: 25, maxSettlingTime: 2.5, settlingBandPct: 2, maxPeakTime: 1.2, maxRiseTime: 0.6, dominanceRatio: 5 };
  const result = evaluate(design, requirements);
  const figures = reportFigures(design, requirements, result);
  const person = (id: number, name: string, email: string) => ({ id, name, email });
  return {
    number: 'PCR-2026-000042',
    signedAt: new Date(),
    signer: person(3, 'Casey Controls', 'controls@example.com'),
    meaning: 'released',
    productLine: { id: 1, name: 'Harbor gimbal axis drives' },
    requirementSet: { id: 1, name: 'Pan axis transient limits' },
    revision: {
      id: 2,
      number: 2,
      sha256: '5f0c1e7d2a9b4c3e8f6a7b1d0e2c4f6a8b0d2e4f6a8c0e2d4f6b8a0c2e4d6f8a',
      requirements,
      rationale: 'Settling tightened after field returns on the pan axis.',
      approvedAt: new Date(Date.now() - 86400e3).toISOString(),
      approver: person(2, 'Sam Systems', 'systems@example.com'),
      author: person(1, 'Alex Admin', 'admin@example.com'),
      impact: { acknowledgedAt: new Date(Date.now() - 86400e3).toISOString(), baselineRevisionId: 1, total: 3, changed: [{ candidateId: 7, name: 'PA-3 slow loop', from: 'compliant', to: 'noncompliant' }] },
    },
    candidate: { id: 5, name: 'PA-4 tuned loop', notes: 'Closed loop with the 15 rad/s current-loop pole.', design },
    assessment: { id: 9, createdAt: new Date().toISOString(), createdBy: person(3, 'Casey Controls', 'controls@example.com'), engineVersion: result.engineVersion ?? ENGINE_VERSION, result },
    bounds: figures.bounds,
    region: figures.region,
    step: figures.step,
    diff: {
      againstRevisionNumber: 1,
      items: [
        { field: 'maxOvershootPct', before: 25, after: 25, change: 'same' },
        { field: 'maxSettlingTime', before: 3, after: 2.5, change: 'tightened' },
        { field: 'settlingBandPct', before: 2, after: 2, change: 'same' },
        { field: 'maxPeakTime', before: null, after: 1.2, change: 'added' },
        { field: 'maxRiseTime', before: 0.6, after: 0.6, change: 'same' },
        { field: 'dominanceRatio', before: 5, after: 5, change: 'same' },
      ],
    },
    auditHead: { id: 1234, hash: 'a3f1c9d0e2b4a6c8e0f2a4c6e8b0d2f4a6c8e0b2d4f6a8c0e2b4d6f8a0c2e4b6' },
    signing,
  };
}
