import { z } from 'zod';

// Inputs and shapes of the core workflow routes (api-contract.md), shared by
// the API's validation and the web forms. Requirements and designs are
// validated by the engine's own schemas (@polecourt/spec) inside these.

export const productLineInputSchema = z
  .object({
    name: z.string().trim().min(1, 'Give the product line a name').max(120, 'Name is too long (120 characters at most)'),
    description: z.string().trim().max(4000, 'Description is too long (4000 characters at most)').default(''),
  })
  .strict();
export type ProductLineInput = z.input<typeof productLineInputSchema>;

// Spelled out rather than `.partial()`: zod 4 applies inner defaults inside
// optional members, so a partial would blank the description on every rename.
export const productLinePatchSchema = z
  .object({
    name: productLineInputSchema.shape.name.optional(),
    description: z.string().trim().max(4000, 'Description is too long (4000 characters at most)').optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });

export const requirementSetInputSchema = z
  .object({
    name: z.string().trim().min(1, 'Give the requirement set a name').max(120, 'Name is too long (120 characters at most)'),
    purpose: z.string().trim().max(2000, 'Purpose is too long (2000 characters at most)').default(''),
  })
  .strict();
export type RequirementSetInput = z.input<typeof requirementSetInputSchema>;

export const REVISION_STATUSES = ['draft', 'in_review', 'approved', 'retired'] as const;
export type RevisionStatus = (typeof REVISION_STATUSES)[number];
export const REVISION_STATUS_LABELS: Record<RevisionStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  approved: 'Approved',
  retired: 'Retired',
};

export const rationaleSchema = z.string().trim().max(8000, 'Rationale is too long (8000 characters at most)');

export const approveRevisionSchema = z
  .object({
    password: z.string().min(1, 'Re-enter your password to sign the approval').max(200),
    impactAcknowledged: z.literal(true, { message: 'Acknowledge the revision impact before approving' }),
  })
  .strict();

export const SIGNATURE_MEANINGS = ['reviewed', 'released'] as const;
export type SignatureMeaning = (typeof SIGNATURE_MEANINGS)[number];

export const candidateInputBaseSchema = z.object({
  name: z.string().trim().min(1, 'Give the candidate a name').max(120, 'Name is too long (120 characters at most)'),
  notes: z.string().trim().max(4000, 'Notes are too long (4000 characters at most)').default(''),
});

export const createAssessmentSchema = z
  .object({
    revisionId: z.number({ message: 'Pick the revision to assess against' }).int().positive().optional(),
  })
  .strict();

export interface PersonRef {
  id: number;
  name: string;
  email: string;
}

export interface ProductLine {
  id: number;
  name: string;
  description: string;
  createdAt: string;
  updatedAt: string;
  requirementSetCount?: number;
  candidateCount?: number;
}

export interface ImpactAcknowledgement {
  acknowledgedAt: string;
  baselineRevisionId: number | null;
  total: number;
  changed: { candidateId: number; name: string; from: string | null; to: string }[];
}

export interface Revision {
  id: number;
  requirementSetId: number;
  number: number;
  status: RevisionStatus;
  requirements: Record<string, number>;
  rationale: string;
  version: number;
  author: PersonRef;
  approver: PersonRef | null;
  submittedAt: string | null;
  approvedAt: string | null;
  retiredAt: string | null;
  /** SHA-256 of the canonical JSON of the requirements; set at approval. */
  sha256: string | null;
  approvalMeaning: 'approved' | null;
  impact: ImpactAcknowledgement | null;
  createdAt: string;
  updatedAt: string;
}

export interface RequirementSet {
  id: number;
  productLineId: number;
  name: string;
  purpose: string;
  createdAt: string;
  revisions: Revision[];
  /** The approved revision in force, if any. */
  currentRevisionId: number | null;
}

export interface CandidateAssessmentSummary {
  assessmentId: number;
  revisionId: number;
  revisionNumber: number;
  requirementSetId: number;
  revisionStatus: RevisionStatus;
  verdict: 'compliant' | 'noncompliant';
  createdAt: string;
}

export interface Candidate {
  id: number;
  productLineId: number;
  name: string;
  notes: string;
  /** The design as submitted (zero-pole-gain or polynomial form). */
  design: Record<string, unknown>;
  createdBy: PersonRef;
  createdAt: string;
  latest: CandidateAssessmentSummary[];
}

export interface StoredAssessment {
  id: number;
  candidateId: number;
  revisionId: number;
  revisionSha256: string;
  engineVersion: string;
  createdAt: string;
  createdBy: PersonRef;
  /** The revision's status now: 'retired' means this was made against an older baseline. */
  revisionStatus: RevisionStatus;
  result: Record<string, unknown>;
}

export interface UploadReport {
  accepted: { row: number; name: string; candidateId: number }[];
  rejected: { row: number; name: string | null; errors: Record<string, string> }[];
}

export interface ImpactRow {
  candidateId: number;
  name: string;
  proposed: { verdict: string; checks: unknown[] } | { error: string };
  current: { verdict: string; checks: unknown[] } | { error: string } | null;
  changed: boolean;
}

export interface RevisionImpact {
  revisionId: number;
  baselineRevisionId: number | null;
  total: number;
  changedCount: number;
  items: ImpactRow[];
}

export const COVERAGE_FILTERS = ['all', 'never_assessed', 'retired_only', 'noncompliant'] as const;
export type CoverageFilter = (typeof COVERAGE_FILTERS)[number];

// ---- Added with the workflow routes ----------------------------------------

/** The parts of a new revision besides `requirements` (validated by the engine's requirementsSchema). */
export const revisionInputBaseSchema = z.object({
  rationale: rationaleSchema.default(''),
});

/** A draft's edit carries the version it was read at (optimistic locking). */
export const revisionPatchBaseSchema = z.object({
  rationale: rationaleSchema.optional(),
  version: z.number({ message: 'Send the version of the revision you edited' }).int('version must be a whole number').positive('version must be positive'),
});

export const REQUIREMENT_FIELDS = [
  'maxOvershootPct',
  'maxSettlingTime',
  'settlingBandPct',
  'maxPeakTime',
  'maxRiseTime',
  'minDampingRatio',
  'maxNaturalFrequency',
  'dominanceRatio',
  'marginPct',
] as const;
export type RequirementField = (typeof REQUIREMENT_FIELDS)[number];

export const DIFF_CHANGES = ['added', 'removed', 'tightened', 'loosened', 'same'] as const;
export type DiffChange = (typeof DIFF_CHANGES)[number];

export interface RevisionDiffRow {
  field: RequirementField;
  before: number | null;
  after: number | null;
  change: DiffChange;
}

export interface RevisionDiff {
  revisionId: number;
  /** The revision compared against; null when the set has no approved revision yet. */
  againstRevisionId: number | null;
  items: RevisionDiffRow[];
}

export const regionQuerySchema = z
  .object({
    reMin: z.coerce.number({ message: 'reMin must be a number' }).finite('reMin must be a number').optional(),
    reMax: z.coerce.number({ message: 'reMax must be a number' }).finite('reMax must be a number').optional(),
    imMin: z.coerce.number({ message: 'imMin must be a number' }).finite('imMin must be a number').optional(),
    imMax: z.coerce.number({ message: 'imMax must be a number' }).finite('imMax must be a number').optional(),
  });
// Query schemas leave out .strict(): on every route an unknown query key is ignored (a body key is refused).

export interface Viewport {
  reMin: number;
  reMax: number;
  imMin: number;
  imMax: number;
}

/** `bounds` and `polygons` are the engine's regionBounds and regionPolygons output. */
export interface RegionResponse {
  revisionId: number;
  viewport: Viewport;
  bounds: Record<string, unknown>;
  polygons: Record<string, unknown>;
}

export interface RequirementSetSummary {
  id: number;
  productLineId: number;
  name: string;
  purpose: string;
  createdAt: string;
  currentRevisionId: number | null;
  currentRevisionNumber: number | null;
  revisionCount: number;
}

export const COVERAGE_STATUSES = ['compliant', 'noncompliant', 'never_assessed', 'retired_only'] as const;
export type CoverageStatus = (typeof COVERAGE_STATUSES)[number];

export const coverageQuerySchema = z
  .object({
    filter: z.enum(COVERAGE_FILTERS, { message: `filter must be one of ${COVERAGE_FILTERS.join(', ')}` }).default('all'),
    format: z.enum(['json', 'csv'], { message: 'format must be json or csv' }).default('json'),
  }); // not strict: unknown query keys are ignored on every route

export interface CoverageRow {
  candidateId: number;
  candidateName: string;
  /** Null when the product line has no approved revision. */
  requirementSetId: number | null;
  requirementSetName: string | null;
  revisionId: number | null;
  revisionNumber: number | null;
  status: CoverageStatus;
  /** The latest assessment against this revision (or, for retired_only, against a retired one). */
  assessmentId: number | null;
  assessedAt: string | null;
  assessedRevisionId: number | null;
}

export interface CoverageReport {
  productLineId: number;
  filter: CoverageFilter;
  total: number;
  items: CoverageRow[];
}
