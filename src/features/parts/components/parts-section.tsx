import { useCallback, useState, type ReactNode } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Part } from '../../../../shared/schemas/part';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { formatQuantity } from '../../../lib/units-display';
import { useJobParts } from '../../../api/parts/get-job-parts';
import { partTotals } from './part-format';
import { PartForm } from './part-form';
import type { RackChoice } from './part-form-fields';
import { PartsTable } from './parts-table';

interface PartsSectionProps {
  jobId: number;
  units: UnitSystem;
  canWrite: boolean;
  /** Undefined while the racks load; the part form waits for them. */
  racks: RackChoice[] | undefined;
  /** Called after a part is saved, so the route can refresh what is worked out from the parts. */
  /** More ways to add parts (the cut-list import link), supplied by the route. */
  actions?: ReactNode;
}

type Editing = { part?: Part } | null;

function Totals({ parts, units }: { parts: Part[]; units: UnitSystem }) {
  const totals = partTotals(parts);
  const items = [
    ['Part lines', String(totals.lines)],
    ['Pieces', String(totals.pieces)],
    ['Coated area', formatQuantity('area', totals.areaM2, units)],
  ];
  return (
    <dl aria-label="Totals" className="mb-3 flex flex-wrap gap-x-8 gap-y-2">
      {items.map(([term, value]) => (
        <div key={term}>
          <dt className="text-sm text-maple-700">{term}</dt>
          <dd className="text-lg font-semibold">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

export function PartsSection({ jobId, units, canWrite, racks, actions }: PartsSectionProps) {
  const parts = useJobParts(jobId);
  const [editing, setEditing] = useState<Editing>(null);
  const edit = useCallback((part: Part) => setEditing({ part }), []);
  const done = () => setEditing(null);

  return (
    <section aria-labelledby="parts-heading">
      <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <h2 id="parts-heading" className="text-xl font-semibold text-lacquer-900">
          Parts
        </h2>
        <div className="flex flex-wrap gap-3">
          {canWrite && <Button onClick={() => setEditing({})}>Add part</Button>}
          {actions}
        </div>
      </div>
      {parts.isPending ? (
        <LoadingState what="parts" />
      ) : parts.isError ? (
        <ErrorState error={parts.error} what="the parts" onRetry={() => parts.refetch()} />
      ) : parts.data.items.length === 0 ? (
        <EmptyState title="No parts yet">{canWrite ? 'Add parts one at a time, or import the whole cut list from a CSV file.' : 'The finishing lead adds the parts.'}</EmptyState>
      ) : (
        <>
          <Totals parts={parts.data.items} units={units} />
          {parts.data.total > parts.data.items.length && (
            <p className="mb-3 font-medium text-verdict-caution">
              <span aria-hidden="true">⚠ </span>Showing the first {parts.data.items.length} of {parts.data.total} part lines; the totals above count only these.
            </p>
          )}
          <PartsTable parts={parts.data.items} units={units} onEdit={canWrite ? edit : undefined} />
        </>
      )}
      {canWrite && (
        <Dialog open={editing !== null} onClose={() => setEditing(null)} wide title={editing?.part ? `Edit ${editing.part.label}` : 'Add a part'}>
          {racks ? <PartForm jobId={jobId} part={editing?.part} racks={racks} units={units} onDone={done} /> : <LoadingState what="the racks" />}
        </Dialog>
      )}
    </section>
  );
}
