import type { UploadReport } from '@polecourt/contracts';
import { type DragEvent, type FormEvent, useId, useRef, useState } from 'react';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { env } from '@/config/env';
import { cx } from '@/utils/cx';

import { MAX_UPLOAD_BYTES, useUploadCandidates } from '../api/upload-candidates';
import { UploadReportView } from './upload-report';

function sizeText(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toPrecision(3)} KB`;
  return `${(bytes / 1024 / 1024).toPrecision(3)} MB`;
}

function CsvColumns() {
  return (
    <dl className="grid grid-cols-[max-content_1fr] gap-x-3 gap-y-1 text-sm">
      <dt className="font-mono text-xs">name</dt>
      <dd>the candidate’s name (required)</dd>
      <dt className="font-mono text-xs">notes</dt>
      <dd>free text (optional)</dd>
      <dt className="font-mono text-xs">gain, poles, zeros</dt>
      <dd>
        the zero-pole-gain form; lists separated by spaces or semicolons, complex values as <code>-2+3j</code>, a conjugate pair once as <code>-2±3j</code>
      </dd>
      <dt className="font-mono text-xs">numerator, denominator</dt>
      <dd>the polynomial form, coefficients highest power first, e.g. <code>1 38 292 1560</code></dd>
    </dl>
  );
}

/** Several candidates at once from a JSON or CSV file, with a report for each row. */
export function UploadPanel({ productLineId }: { productLineId: number }) {
  const inputId = useId();
  const hintId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [dragging, setDragging] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [report, setReport] = useState<UploadReport | null>(null);

  const upload = useUploadCandidates({ mutationConfig: { onSuccess: (r) => setReport(r) } });

  const pick = (next: File | null) => {
    upload.reset();
    setReport(null);
    setProblem(null);
    if (next && next.size > MAX_UPLOAD_BYTES) {
      setProblem(`“${next.name}” is ${sizeText(next.size)}; files of at most 2 MB are accepted. Split it into smaller files.`);
      setFile(null);
      return;
    }
    setFile(next);
  };

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    const dropped = event.dataTransfer.files[0] ?? null;
    if (event.dataTransfer.files.length > 1) setProblem('Drop one file at a time.');
    else pick(dropped);
  };

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    if (!file) {
      setProblem('Choose a JSON or CSV file first.');
      inputRef.current?.focus();
      return;
    }
    upload.mutate({ productLineId, file });
  };

  const fileError = upload.error?.fields.file;

  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <div className="flex flex-col gap-5">
        <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
          <div
            onDragOver={(e) => {
              e.preventDefault();
              setDragging(true);
            }}
            onDragLeave={() => setDragging(false)}
            onDrop={onDrop}
            data-drop-zone=""
            className={cx(
              'flex flex-col items-center gap-3 rounded border-2 border-dashed px-6 py-8 text-center',
              dragging ? 'border-accent bg-accent-soft' : 'border-rule-strong bg-paper-raised',
            )}
          >
            <p className="font-medium">Drop a JSON or CSV file here</p>
            <p className="text-sm text-ink-muted">or choose it:</p>
            <label htmlFor={inputId} className="sr-only">
              Candidates file (JSON or CSV)
            </label>
            <input
              ref={inputRef}
              id={inputId}
              type="file"
              accept=".csv,.json,text/csv,application/json"
              aria-describedby={hintId}
              aria-invalid={fileError || problem ? true : undefined}
              onChange={(e) => pick(e.target.files?.[0] ?? null)}
              className="max-w-full text-sm file:mr-3 file:rounded file:border file:border-rule-strong file:bg-paper file:px-3 file:py-1.5 file:text-sm file:font-medium"
            />
            <p id={hintId} className="text-xs text-ink-muted">
              At most 2 MB and 5,000 candidates per file. Nothing is saved until you press “Upload”.
            </p>
            {file && (
              <p className="text-sm" aria-live="polite">
                Ready: <span className="font-medium">{file.name}</span> ({sizeText(file.size)})
              </p>
            )}
          </div>

          {problem && (
            <Alert tone="error" title="No file to upload">
              <p>{problem}</p>
            </Alert>
          )}
          {upload.error && (
            <Alert tone="error" title="The file was not read">
              <p>{fileError ?? upload.error.message}</p>
              <p className="mt-1">Nothing was saved. Correct the file and upload it again; it is still selected.</p>
            </Alert>
          )}

          <div className="flex justify-end">
            <Button type="submit" variant="primary" busy={upload.isPending}>
              {upload.isPending ? 'Uploading…' : 'Upload'}
            </Button>
          </div>
        </form>

        {report && <UploadReportView report={report} />}
      </div>

      <aside aria-labelledby="format-heading" className="flex flex-col gap-3 self-start rounded border border-rule bg-paper-raised p-4">
        <h2 id="format-heading" className="text-sm font-semibold">
          File format
        </h2>
        <p className="text-sm text-ink-muted">
          A CSV file has a header line naming its columns (in any order) and one candidate per line. Each row uses either the zero-pole-gain
          columns or the polynomial ones and leaves the others empty.
        </p>
        <CsvColumns />
        <p className="text-sm text-ink-muted">
          A JSON file holds one candidate <code>{'{name, notes, design}'}</code>, a list of them, or <code>{'{"candidates": [...]}'}</code>.
        </p>
        <p className="flex flex-wrap gap-4 text-sm">
          <a href={`${env.apiBaseUrl}/candidates/upload-example.csv`} download className="font-medium text-accent underline underline-offset-2">
            Example CSV file
          </a>
          <a href={`${env.apiBaseUrl}/candidates/upload-example.json`} download className="font-medium text-accent underline underline-offset-2">
            Example JSON file
          </a>
        </p>
      </aside>
    </div>
  );
}
