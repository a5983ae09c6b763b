import { REVISION_STATUS_LABELS, type RevisionStatus } from '@polecourt/contracts';

import { cx } from '@/utils/cx';

// Quiet colours, always with the word: draft is paper, in review amber, approved teal, retired grey.
const tone: Record<RevisionStatus, string> = {
  draft: 'border-rule-strong bg-paper text-ink-muted',
  in_review: 'border-caution/40 bg-caution-soft text-caution',
  approved: 'border-accent/40 bg-accent-soft text-accent-strong',
  retired: 'border-rule bg-paper-sunk text-ink-faint',
};

export function RevisionStatusBadge({ status, className }: { status: RevisionStatus; className?: string }) {
  return (
    <span className={cx('inline-block rounded border px-2 py-0.5 text-xs font-semibold whitespace-nowrap', tone[status], className)}>
      {REVISION_STATUS_LABELS[status]}
    </span>
  );
}
