import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity } from '../../../lib/units-display';
import type { Estimate as JobEstimate } from '../../../../shared/schemas/job';
import { coatOfWords, upperFirst } from '../../../../shared/words';
import { litres, money, vocMass, type MoneyFormat } from './estimate-format';

type Step = JobEstimate['steps'][number];

const th = 'whitespace-nowrap border-b border-maple-300 px-3 py-2 text-sm font-semibold text-maple-800';
const td = 'whitespace-nowrap px-3 py-2';
const none = <span className="text-maple-700">No data</span>;
const headers = ['Coat', 'Product', 'Dry film', 'Mixed', 'Ready to spray', 'Mix to spray', 'VOC', 'Cost'];

function Voc({ grams, units }: { grams: number; units: UnitSystem }) {
  const { main, kilograms } = vocMass(grams, units);
  return (
    <>
      {main}
      {kilograms && <span className="block text-sm text-maple-700">{kilograms}</span>}
    </>
  );
}

/** Base, hardener and thinner for the ready-to-spray amount, one under the other. */
function Mix({ mix, units }: { mix: Step['mix']; units: UnitSystem }) {
  return (
    <span className="block text-sm">
      Base {litres(mix.baseL, units)}
      <span className="block">{mix.hardenerL > 0 ? `Hardener ${litres(mix.hardenerL, units)}` : 'No hardener (one-pack)'}</span>
      <span className="block">Thinner {litres(mix.thinnerL, units)}</span>
    </span>
  );
}

function StepRow({ step, index, coats, units, format }: { step: Step; index: number; coats: number; units: UnitSystem; format: MoneyFormat }) {
  return (
    <tr className="border-b border-maple-200 even:bg-maple-50">
      {/* Positions count from 0 and include denib steps; people count coats from 1. */}
      <th scope="row" className={`${td} font-semibold`}>
        {upperFirst(coatOfWords(index + 1, coats))}
      </th>
      <td className="min-w-40 px-3 py-2">{step.productName}</td>
      <td className={td}>{formatQuantity('filmThickness', step.dryFilmUm, units)}</td>
      <td className={td}>{litres(step.mixedL, units)}</td>
      <td className={`${td} font-semibold`}>{litres(step.readyToSprayL, units)}</td>
      <td className={td}>
        <Mix mix={step.mix} units={units} />
      </td>
      <td className={td}>{step.vocG === null ? none : <Voc grams={step.vocG} units={units} />}</td>
      <td className={td}>{step.cost === null ? none : money(step.cost, format)}</td>
    </tr>
  );
}

/** One row per coat step and a totals row; a plain table because the shared DataTable has no footer. */
export function EstimateTable({ estimate, units, locale }: { estimate: JobEstimate; units: UnitSystem; locale: string }) {
  const { totals } = estimate;
  const format = { currency: estimate.currency, locale };
  return (
    <div role="region" aria-label="Material per coat step" tabIndex={0} className="overflow-x-auto rounded-panel border border-maple-300 bg-white">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Material per coat step</caption>
        <thead className="bg-maple-100">
          <tr>
            {headers.map((name) => (
              <th key={name} scope="col" className={th}>
                {name}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {estimate.steps.map((step, index) => (
            <StepRow key={step.position} step={step} index={index} coats={estimate.steps.length} units={units} format={format} />
          ))}
        </tbody>
        <tfoot className="bg-lacquer-50 font-semibold">
          <tr>
            <th scope="row" colSpan={3} className={td}>
              All steps
            </th>
            <td className={td}>{litres(totals.mixedL, units)}</td>
            <td className={td}>{litres(totals.readyToSprayL, units)}</td>
            <td className={td} />
            <td className={td}>
              <Voc grams={totals.vocG} units={units} />
            </td>
            <td className={td}>{money(totals.cost, format)}</td>
          </tr>
        </tfoot>
      </table>
    </div>
  );
}
