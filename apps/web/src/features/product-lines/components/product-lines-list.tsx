import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';

import { ErrorPanel } from '@/components/errors/error-panel';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { Loading } from '@/components/ui/loading';

import { PRODUCT_LINES_PAGE_SIZE, useProductLines } from '../api/get-product-lines';

import { CreateProductLineForm } from './create-product-line-form';

/** Every product line with its counts; systems engineers and administrators may add one. */
export function ProductLinesList({ canCreate, page, onPageChange }: { canCreate: boolean; page: number; onPageChange: (page: number) => void }) {
  const lines = useProductLines({ page });
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const total = lines.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / PRODUCT_LINES_PAGE_SIZE));

  return (
    <section aria-labelledby="lines-heading" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="lines-heading" className="text-lg font-semibold">
          All product lines
        </h2>
        {canCreate && (
          <Button variant="primary" onClick={() => setCreating(true)}>
            New product line
          </Button>
        )}
      </div>
      {lines.isPending ? (
        <Loading label="Loading product lines…" />
      ) : lines.isError ? (
        <ErrorPanel error={lines.error} title="The product lines could not be loaded" onRetry={() => void lines.refetch()} />
      ) : lines.data.items.length === 0 ? (
        <p className="rounded border border-dashed border-rule-strong bg-paper-raised px-4 py-6 text-sm text-ink-muted">
          No product lines yet.{canCreate ? ' Add the first with “New product line”.' : ' A systems engineer adds them.'}
        </p>
      ) : (
        <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
          <table className="w-full border-collapse text-left text-sm">
            <caption className="sr-only">Product lines</caption>
            <thead className="border-b border-rule bg-paper-sunk text-xs uppercase tracking-wide text-ink-muted">
              <tr>
                <th scope="col" className="px-4 py-2 font-medium">
                  Name
                </th>
                <th scope="col" className="px-4 py-2 font-medium">
                  Description
                </th>
                <th scope="col" className="px-4 py-2 text-right font-medium">
                  Requirement sets
                </th>
                <th scope="col" className="px-4 py-2 text-right font-medium">
                  Candidates
                </th>
              </tr>
            </thead>
            <tbody>
              {lines.data.items.map((line) => (
                <tr key={line.id} className="border-b border-rule last:border-b-0">
                  <th scope="row" className="px-4 py-2.5 font-medium">
                    <Link to={`/product-lines/${line.id}`} className="text-accent underline-offset-2 hover:underline">
                      {line.name}
                    </Link>
                  </th>
                  <td className="max-w-md px-4 py-2.5 text-ink-muted">{line.description || '—'}</td>
                  <td className="px-4 py-2.5 text-right tabular-nums">{line.requirementSetCount ?? '—'}</td>
                  <td className="px-4 py-2.5 text-right tabular-nums">{line.candidateCount ?? '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {total > PRODUCT_LINES_PAGE_SIZE && (
        <nav aria-label="Pages of product lines" className="flex items-center justify-end gap-2 text-sm">
          <Button size="sm" disabled={page <= 1} onClick={() => onPageChange(page - 1)}>
            Previous page
          </Button>
          <Button size="sm" disabled={page >= pages} onClick={() => onPageChange(page + 1)}>
            Next page
          </Button>
        </nav>
      )}
      {canCreate && (
        <Dialog open={creating} onClose={() => setCreating(false)} title="New product line" description="A family of products that share one set of transient requirements.">
          <CreateProductLineForm
            onCancel={() => setCreating(false)}
            onCreated={(line) => {
              setCreating(false);
              void navigate(`/product-lines/${line.id}`);
            }}
          />
        </Dialog>
      )}
    </section>
  );
}
