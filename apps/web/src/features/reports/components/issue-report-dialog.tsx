import { zodResolver } from '@hookform/resolvers/zod';
import { REPORT_MEANING_LABELS, REPORT_MEANING_STATEMENTS, type ReportRecord, SIGNATURE_MEANINGS } from '@polecourt/contracts';
import { useId } from 'react';
import { useForm } from 'react-hook-form';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextField } from '@/components/ui/text-field';

import { type IssueReportInput, issueReportSchema, useIssueReport } from '../api/issue-report';

const FIELDS = ['password', 'meaning'] as const;

/**
 * "Issue compliance report": the signer states the meaning of the signature and
 * re-enters the password (the two parts of an electronic signature). For the
 * assessment view to place beside an assessment.
 */
export function IssueReportDialog({
  assessmentId,
  open,
  onClose,
  onIssued,
  schema = issueReportSchema,
}: {
  assessmentId: number;
  open: boolean;
  onClose: () => void;
  onIssued?: (report: ReportRecord) => void;
  schema?: typeof issueReportSchema;
}) {
  const legendId = useId();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<IssueReportInput>({ resolver: zodResolver(schema), defaultValues: { password: '', meaning: 'reviewed' } });

  const issue = useIssueReport({
    mutationConfig: {
      onSuccess: (report) => {
        reset();
        onIssued?.(report);
      },
      onError: (error) => {
        for (const [field, message] of Object.entries(error.fields)) {
          if ((FIELDS as readonly string[]).includes(field)) setError(field as (typeof FIELDS)[number], { message });
        }
      },
    },
  });
  const fieldError = issue.error && Object.keys(issue.error.fields).some((f) => (FIELDS as readonly string[]).includes(f));

  return (
    <Dialog
      open={open}
      onClose={() => {
        issue.reset();
        onClose();
      }}
      title="Issue compliance report"
      description="A signed PDF of this assessment. Your signature shows your printed name, the date and time (UTC) and what it means; the report is never changed afterwards."
    >
      {issue.data ? (
        <div className="flex flex-col gap-4">
          <Alert tone="success" title={`Report ${issue.data.number} is signed`}>
            <p>It is in the archive; auditors are told by e-mail.</p>
          </Alert>
          <div className="flex justify-end">
            <Button variant="primary" onClick={onClose}>
              Close
            </Button>
          </div>
        </div>
      ) : (
        <form noValidate onSubmit={handleSubmit((data) => issue.mutate({ assessmentId, data }))} className="flex flex-col gap-4">
          {issue.error && !fieldError && (
            <Alert tone="error" title="The report was not issued">
              <p>{issue.error.message}</p>
            </Alert>
          )}
          <fieldset aria-describedby={errors.meaning ? `${legendId}-error` : undefined}>
            <legend id={legendId} className="text-sm font-medium">
              Meaning of your signature
            </legend>
            <div className="mt-2 flex flex-col gap-2">
              {SIGNATURE_MEANINGS.map((m) => (
                <label key={m} className="flex cursor-pointer gap-3 rounded border border-rule-strong bg-paper-raised px-3 py-2 has-[:checked]:border-accent has-[:checked]:bg-accent-soft">
                  <input type="radio" value={m} className="mt-1 accent-[var(--color-accent)]" {...register('meaning')} />
                  <span>
                    <span className="block text-sm font-semibold">{REPORT_MEANING_LABELS[m]}</span>
                    <span className="block text-sm text-ink-muted">{REPORT_MEANING_STATEMENTS[m]}</span>
                  </span>
                </label>
              ))}
            </div>
            {errors.meaning && (
              <p id={`${legendId}-error`} className="mt-1 text-sm text-fail">
                {errors.meaning.message}
              </p>
            )}
          </fieldset>
          <TextField
            label="Your password"
            type="password"
            autoComplete="current-password"
            hint="Re-enter it to sign. Signing with it is the same as your handwritten signature."
            error={errors.password?.message}
            {...register('password')}
          />
          <div className="flex justify-end gap-2 pt-2">
            <Button onClick={onClose}>Cancel</Button>
            <Button type="submit" variant="primary" busy={issue.isPending}>
              {issue.isPending ? 'Signing…' : 'Sign and issue'}
            </Button>
          </div>
        </form>
      )}
    </Dialog>
  );
}
