import { useState } from 'react';
import { adjustDryingTimes, type AdjustedDryingTimes } from '../../../../shared/finishing/drying-times';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import { TemperatureField } from '../../../components/ui/temperature-field';
import { dryingMethodWords, formatHours, formatMinutes } from '../../../lib/durations';

interface DryingPreviewProps {
  product: Product;
  units: UnitSystem;
  startTempC: number;
}

function tryAdjust(product: Product, tempC: number, units: UnitSystem): AdjustedDryingTimes | { error: string } {
  try {
    return adjustDryingTimes(product.dryingTimes, tempC, { minApplicationTempC: product.minApplicationTempC, units });
  } catch (error) {
    return { error: error instanceof Error ? error.message : 'These times could not be worked out.' };
  }
}

function TimesList({ result }: { result: AdjustedDryingTimes }) {
  const { times } = result;
  const items: [string, string][] = [
    ['Flash-off', formatMinutes(times.flashOffMin)],
    ['Recoat window opens', formatMinutes(times.recoatMinMin)],
    ['Recoat window closes', times.recoatMaxMin === null ? 'Never (no limit given)' : formatMinutes(times.recoatMaxMin)],
    ['Touch dry', formatMinutes(times.touchDryMin)],
    ['Dry to handle', formatMinutes(times.handleMin)],
    ['Dry to pack', formatMinutes(times.packMin)],
    ['Full cure', formatHours(times.fullCureH)],
  ];
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
      {items.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-maple-700">{term}</dt>
          <dd className="whitespace-nowrap font-semibold">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The saved drying table worked out at another temperature, so a lead can see what a cold morning does. */
export function DryingPreview({ product, units, startTempC }: DryingPreviewProps) {
  const [tempC, setTempC] = useState(startTempC);
  const result = tryAdjust(product, tempC, units);
  return (
    <section aria-labelledby="preview-heading" className="rounded-panel border border-maple-300 bg-white p-4">
      <h2 id="preview-heading" className="text-lg font-semibold">
        Drying at another temperature
      </h2>
      <p className="mb-3 text-sm text-maple-700">Times after each coat goes on, from the saved data sheet.</p>
      <TemperatureField label="Drying temperature" valueC={tempC} onChange={setTempC} units={units} className="mb-3 max-w-48" />
      <div aria-live="polite">
        {'error' in result ? (
          <p className="font-medium text-verdict-stop">{result.error}</p>
        ) : (
          <>
            <TimesList result={result} />
            <p className="mt-3 text-sm">
              <span className="font-semibold">How: </span>
              {dryingMethodWords[result.method]}
            </p>
            {result.warnings.length > 0 && (
              <ul className="mt-3 space-y-2">
                {result.warnings.map((warning) => (
                  <li key={warning.code} className="rounded-panel border-2 border-verdict-caution p-2 text-sm font-medium">
                    <span className="text-verdict-caution">⚠ Caution: </span>
                    {warning.message}
                  </li>
                ))}
              </ul>
            )}
          </>
        )}
      </div>
    </section>
  );
}
