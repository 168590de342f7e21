import type { UnitSystem } from '../../../../shared/schemas/common';
import type { FinishSystem } from '../../../../shared/schemas/finish-system';
import { Button } from '../../../components/ui/button';
import { formatQuantity } from '../../../lib/units-display';
import { coatAtStepWords, terms, upperFirst } from '../../../../shared/words';
import { SystemTotals } from './system-totals';
import type { ProductsById } from './system-maths';

interface FinishSystemCardProps {
  system: FinishSystem;
  units: UnitSystem;
  /** Null when the data sheets cannot be read; the steps still show, the sums do not. */
  products: ProductsById | null;
  tempC: number;
  onEdit?: (system: FinishSystem) => void;
}

function StepList({ system, units }: { system: FinishSystem; units: UnitSystem }) {
  return (
    <ol className="space-y-1">
      {system.steps.map((step, index) => (
        <li key={step.position} className="flex gap-2">
          <span className="inline-flex h-7 w-7 shrink-0 items-center justify-center rounded-full bg-maple-200 text-sm font-semibold">{index + 1}</span>
          {step.kind === 'coat' ? (
            <span>
              <span className="font-semibold">{upperFirst(coatAtStepWords(system.steps, step.position) ?? terms.coat)}:</span> {step.productName}, {formatQuantity('filmThickness', step.dryFilmUm, units)} dry
            </span>
          ) : (
            <span>
              <span className="font-semibold">{upperFirst(terms.denib)}</span> with {step.grit}
            </span>
          )}
        </li>
      ))}
    </ol>
  );
}

export function FinishSystemCard({ system, units, products, tempC, onEdit }: FinishSystemCardProps) {
  const headingId = `finish-system-${system.id}`;
  return (
    <article aria-labelledby={headingId} className="rounded-panel border border-maple-300 bg-white p-4">
      <div className="mb-2 flex flex-wrap items-start justify-between gap-3">
        <div>
          <h2 id={headingId} className="text-lg font-semibold text-lacquer-900">
            {system.name}
          </h2>
          {system.description && <p className="text-maple-700">{system.description}</p>}
        </div>
        {onEdit && (
          <Button variant="secondary" onClick={() => onEdit(system)} aria-label={`Edit ${system.name}`}>
            Edit
          </Button>
        )}
      </div>
      <div className="grid gap-4 lg:grid-cols-2">
        <StepList system={system} units={units} />
        {products ? (
          <SystemTotals steps={system.steps} products={products} tempC={tempC} units={units} />
        ) : (
          <p className="text-maple-700">
            {system.coatCount} {system.coatCount === 1 ? 'coat' : 'coats'}. Litres and drying times come from the data sheets, which are not open to your role.
          </p>
        )}
      </div>
    </article>
  );
}
