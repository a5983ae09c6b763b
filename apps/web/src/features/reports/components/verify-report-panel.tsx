import type { ReportVerification } from '@polecourt/contracts';
import { type DragEvent, useId, useState } from 'react';

import { Alert } from '@/components/ui/alert';
import { cx } from '@/utils/cx';

import { VERIFY_REPORT_MAX_BYTES, useVerifyReport } from '../api/verify-report';
import { meaningWord, utc } from './report-words';
import { VerdictBadge } from './verdict-badge';

function Finding({ ok, yes, no }: { ok: boolean; yes: string; no: string }) {
  return (
    <li className="flex gap-2">
      <span className={cx('w-16 shrink-0 font-semibold', ok ? 'text-pass' : 'text-fail')}>{ok ? 'Yes' : 'No'}</span>
      <span>{ok ? yes : no}</span>
    </li>
  );
}

function Result({ answer }: { answer: ReportVerification }) {
  const r = answer.report;
  const rc = answer.recomputed;
  return (
    <section aria-live="polite" className="flex flex-col gap-4">
      <Alert tone={answer.valid ? 'success' : 'error'} title={answer.valid ? 'Valid: this is a report Polecourt issued, unchanged' : 'Not valid'}>
        <p>{answer.summary}</p>
      </Alert>
      <ul className="flex flex-col gap-1 text-sm">
        <Finding ok={answer.intact} yes="The signature is intact: it covers the whole file and was made with Polecourt's certificate." no={`The signature is not intact. ${answer.signature.summary}`} />
        <Finding ok={answer.issuedHere} yes="Polecourt issued exactly this file (its SHA-256 matches the record)." no="Polecourt has no report with exactly this content." />
        {rc.available && (
          <Finding
            ok={Boolean(rc.agrees)}
            yes={`Recomputed from the attached inputs with engine ${rc.engineVersionNow}: the numbers agree.`}
            no={`Recomputed from the attached inputs with engine ${rc.engineVersionNow} (report made with ${rc.engineVersionThen}): the results differ by up to ${((rc.maxRelativeDifference ?? 0) * 100).toPrecision(3)} %${rc.verdictThen !== rc.verdictNow ? `, and the verdict would now be ${rc.verdictNow}` : ''}.`}
          />
        )}
      </ul>
      {!rc.available && <p className="text-sm text-ink-muted">{rc.reason}</p>}
      {r && (
        <dl className="grid grid-cols-[max-content_1fr] gap-x-6 gap-y-1 rounded border border-rule bg-paper-raised p-4 text-sm">
          <dt className="text-ink-muted">Report</dt>
          <dd className="font-medium tabular-nums">{r.number}</dd>
          <dt className="text-ink-muted">Candidate</dt>
          <dd>
            {r.candidateName} ({r.productLineName})
          </dd>
          <dt className="text-ink-muted">Revision</dt>
          <dd>
            {r.requirementSetName}, revision {r.revisionNumber}
          </dd>
          <dt className="text-ink-muted">Verdict</dt>
          <dd>
            <VerdictBadge verdict={r.verdict} />
          </dd>
          <dt className="text-ink-muted">Signed</dt>
          <dd>
            {meaningWord(r.meaning)} by {r.signer.name} ({r.signer.email}), {utc(r.signedAt)}
          </dd>
          <dt className="text-ink-muted">SHA-256</dt>
          <dd className="break-all font-mono text-xs">{answer.sha256}</dd>
        </dl>
      )}
    </section>
  );
}

/** Verify a report: drop a PDF (or pick one); the answer comes back in plain words with the record. */
export function VerifyReportPanel() {
  const inputId = useId();
  const [dragging, setDragging] = useState(false);
  const [tooBig, setTooBig] = useState<string | null>(null);
  const verify = useVerifyReport();

  function take(file: File | undefined) {
    if (!file) return;
    setTooBig(null);
    if (file.size > VERIFY_REPORT_MAX_BYTES) {
      setTooBig(`${file.name} is ${(file.size / 1024 / 1024).toFixed(1)} MB; reports up to 10 MB can be verified.`);
      return;
    }
    verify.mutate({ file });
  }

  function onDrop(e: DragEvent<HTMLLabelElement>) {
    e.preventDefault();
    setDragging(false);
    take(e.dataTransfer.files[0]);
  }

  return (
    <div className="flex flex-col gap-6">
      <label
        htmlFor={inputId}
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={cx(
          'flex cursor-pointer flex-col items-center gap-2 rounded border-2 border-dashed px-6 py-10 text-center focus-within:border-accent',
          dragging ? 'border-accent bg-accent-soft' : 'border-rule-strong bg-paper-raised hover:border-ink-muted',
        )}
      >
        <span className="text-base font-semibold">Drop a compliance report here</span>
        <span className="text-sm text-ink-muted">or choose the PDF file (up to 10 MB). Nothing is stored; the check is recorded in the audit trail.</span>
        <input
          id={inputId}
          type="file"
          accept="application/pdf,.pdf"
          className="mt-2 text-sm file:mr-3 file:rounded file:border file:border-rule-strong file:bg-paper file:px-3 file:py-1.5 file:text-sm file:font-medium"
          onChange={(e) => {
            take(e.target.files?.[0]);
            e.target.value = '';
          }}
        />
      </label>
      {verify.isPending && <p className="text-sm text-ink-muted" role="status">Checking the signature and the record…</p>}
      {tooBig && (
        <Alert tone="error" title="That file is too large">
          <p>{tooBig}</p>
        </Alert>
      )}
      {verify.error && (
        <Alert tone="error" title="The file could not be verified">
          <p>{verify.error.fields.file ? `${verify.error.message}` : verify.error.message}</p>
        </Alert>
      )}
      {verify.data && !verify.isPending && <Result answer={verify.data} />}
    </div>
  );
}
