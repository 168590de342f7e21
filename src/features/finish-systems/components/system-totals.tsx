import { missedWindowScuffGrit } from '../../../../shared/finishing/readiness';
import type { SystemStepTime } from '../../../../shared/finishing/system-time';
import { denibWords, upperFirst } from '../../../../shared/words';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { litresToUsGallons, squareFeetToSquareMetres } from '../../../../shared/units';
import { dryingMethodWords, formatMinutes } from '../../../lib/durations';
import { formatNumber, formatQuantity } from '../../../lib/units-display';
import { litresPerSquareMetre, stepsComplete, timeThroughSystem, type ProductsById, type StepDraft } from './system-maths';

interface SystemTotalsProps {
  steps: StepDraft[];
  products: ProductsById;
  tempC: number;
  units: UnitSystem;
}

function materialWords(litresPerM2: number, units: UnitSystem): string {
  if (units === 'metric') return `${formatNumber(litresPerM2, 3)} L per m²`;
  return `${formatNumber(litresToUsGallons(litresPerM2 * squareFeetToSquareMetres(100)), 2)} US gal per 100 ft²`;
}

function stepWords(step: SystemStepTime, draft: StepDraft, products: ProductsById): string {
  if (draft.kind === 'abrade') {
    const denib = upperFirst(denibWords(draft.grit ?? missedWindowScuffGrit));
    if (step.waitsFor === 'not-counted') return `${denib}: outside first coat to packed, not counted`;
    return `${denib}: ${formatMinutes(step.minutes)} allowed (common practice, not from a data sheet)`;
  }
  const name = products.get(draft.productId ?? 0)?.name ?? 'Coat';
  const what = step.waitsFor === 'pack' ? 'last coat, until it can be packed' : 'until the next coat may go on';
  return `${name}: ${formatMinutes(step.minutes)}, ${what}`;
}

/** Coats, material and the shortest time through a system, with the working shown. */
export function SystemTotals({ steps, products, tempC, units }: SystemTotalsProps) {
  const coats = steps.filter((s) => s.kind === 'coat').length;
  if (!stepsComplete(steps, products)) {
    return <p className="text-maple-700">{coats} {coats === 1 ? 'coat' : 'coats'}. Choose a product and a dry film for every coat to see litres and drying time.</p>;
  }
  const time = timeThroughSystem(steps, products, tempC, units);
  return (
    <div className="space-y-2">
      <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[auto_1fr]">
        <dt className="text-maple-700">Coats</dt>
        <dd className="font-semibold">{coats}</dd>
        <dt className="text-maple-700">Paint as supplied</dt>
        <dd>
          <span className="font-semibold">{materialWords(litresPerSquareMetre(steps, products), units)}</span>{' '}
          <span className="text-sm text-maple-700">of coated face, theoretical: before transfer losses and what bare wood or MDF soaks up.</span>
        </dd>
        <dt className="text-maple-700">Shortest time through</dt>
        <dd>
          {'error' in time ? (
            <span className="font-medium text-verdict-stop">{time.error}</span>
          ) : (
            <>
              <span className="font-semibold">{formatMinutes(time.totalMin)}</span>{' '}
              <span className="text-sm text-maple-700">at {formatQuantity('temperature', tempC, units)}, from the first coat until the last can be packed.</span>
            </>
          )}
        </dd>
      </dl>
      {!('error' in time) && (
        <>
          <details className="text-sm">
            <summary className="inline-flex min-h-touch cursor-pointer items-center font-semibold text-lacquer-800">How this adds up</summary>
            <ol className="ml-5 list-decimal space-y-1">
              {time.perStep.map((step) => (
                <li key={step.index}>
                  {stepWords(step, steps[step.index], products)}
                  {step.method && <span className="block text-maple-700">{dryingMethodWords[step.method]}</span>}
                </li>
              ))}
            </ol>
          </details>
          {time.warnings.map((warning) => (
            <p key={warning.message} className="rounded-panel border-2 border-verdict-caution p-2 text-sm font-medium">
              <span className="text-verdict-caution">⚠ Caution: </span>
              {warning.message}
            </p>
          ))}
        </>
      )}
    </div>
  );
}
