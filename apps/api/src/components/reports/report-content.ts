import type { ImpactAcknowledgement, PersonRef, RevisionDiffRow, SignatureMeaning } from '@polecourt/contracts';
import type { Assessment, RegionBounds, RegionPlot } from '@polecourt/spec';

/** Everything a compliance report shows, gathered before any drawing. */
export interface ReportContent {
  number: string;
  signedAt: Date;
  signer: PersonRef;
  meaning: SignatureMeaning;
  productLine: { id: number; name: string };
  requirementSet: { id: number; name: string };
  revision: {
    id: number;
    number: number;
    sha256: string;
    requirements: Record<string, number>;
    rationale: string;
    approvedAt: string | null;
    approver: PersonRef | null;
    author: PersonRef | null;
    impact: ImpactAcknowledgement | null;
  };
  candidate: { id: number; name: string; notes: string; design: Record<string, unknown> };
  assessment: { id: number; createdAt: string; createdBy: PersonRef | null; engineVersion: string; result: Assessment };
  /** The admissible region for the s-plane plot (engine output for the plot's viewport). */
  bounds: RegionBounds;
  region: RegionPlot;
  /** The exact step response, sampled for drawing. */
  step: { t: number[]; y: number[] };
  diff: { againstRevisionNumber: number | null; items: RevisionDiffRow[] };
  auditHead: { id: number | null; hash: string };
  signing: { subject: string; certificateSha256: string };
}

/** The JSON file embedded in the PDF: the assessment's inputs and outputs, enough to recompute it. */
export interface ReportEvidence {
  kind: 'polecourt.compliance-report.evidence';
  formatVersion: 1;
  reportNumber: string;
  signedAt: string;
  assessment: { id: number; createdAt: string; engineVersion: string };
  candidate: { id: number; name: string; design: Record<string, unknown> };
  revision: { id: number; number: number; sha256: string; requirements: Record<string, number> };
  result: Assessment;
}

export function evidenceOf(c: ReportContent): ReportEvidence {
  return {
    kind: 'polecourt.compliance-report.evidence',
    formatVersion: 1,
    reportNumber: c.number,
    signedAt: c.signedAt.toISOString(),
    assessment: { id: c.assessment.id, createdAt: c.assessment.createdAt, engineVersion: c.assessment.engineVersion },
    candidate: { id: c.candidate.id, name: c.candidate.name, design: c.candidate.design },
    revision: { id: c.revision.id, number: c.revision.number, sha256: c.revision.sha256, requirements: c.revision.requirements },
    result: c.assessment.result,
  };
}
