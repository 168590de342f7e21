import { useState, type ReactNode } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Part } from '../../../../shared/schemas/part';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { LoadingState } from '../../../components/ui/states';
import { formatQuantity } from '../../../lib/units-display';
import { facesWords, partSize, rackPlace, spacedTag } from './part-format';
import { PartForm } from './part-form';
import type { RackChoice } from './part-form-fields';
import { PartStateBadge } from './part-state-badge';

interface PartPageProps {
  part: Part;
  units: UnitSystem;
  canWrite: boolean;
  racks: RackChoice[] | undefined;
  /** The part's job in a line, with a link to it; supplied by the route. */
  job: ReactNode;
  /** The state as worked out now (it moves on with the clock); the stored one until that is known. */
  stateNow?: string;
  /** What the part needs next and when it is ready, shown above its facts; supplied by the route. */
  status?: ReactNode;
}

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="rounded-panel border border-maple-300 bg-white p-4">
      <dt className="text-sm font-medium text-maple-700">{term}</dt>
      <dd className="mt-1 text-lg font-semibold">{children}</dd>
    </div>
  );
}

/** What a scanned rack tag opens: large, plain facts for someone at the rack with gloves on. */
export function PartPage({ part, units, canWrite, racks, job, stateNow, status }: PartPageProps) {
  const [editing, setEditing] = useState(false);
  return (
    <>
      <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="font-mono text-lg font-bold tracking-wider text-lacquer-700">Tag {spacedTag(part.tag)}</p>
          <h1 className="text-2xl font-bold text-lacquer-900 sm:text-3xl">{part.label}</h1>
          <div className="mt-1 text-maple-800">{job}</div>
        </div>
        {canWrite && (
          <Button variant="secondary" onClick={() => setEditing(true)}>
            Edit part
          </Button>
        )}
      </div>
      {status}
      <dl className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <Fact term="State">
          <PartStateBadge state={stateNow ?? part.state} />
        </Fact>
        <Fact term="Rack and shelf">{rackPlace(part)}</Fact>
        <Fact term="Size">{partSize(part)}</Fact>
        <Fact term="Pieces">{part.quantity}</Fact>
        <Fact term="Coated surfaces">{facesWords(part)}</Fact>
        <Fact term="Coated area">
          {formatQuantity('area', part.pieceAreaM2, units)} a piece, {formatQuantity('area', part.coatedAreaM2, units)} in all
        </Fact>
        {part.kind && <Fact term="Kind">{part.kind}</Fact>}
      </dl>
      {canWrite && (
        <Dialog open={editing} onClose={() => setEditing(false)} wide title={`Edit ${part.label}`}>
          {racks ? (
            <PartForm jobId={part.jobId} part={part} racks={racks} units={units} onDone={() => setEditing(false)} />
          ) : (
            <LoadingState what="the racks" />
          )}
        </Dialog>
      )}
    </>
  );
}
