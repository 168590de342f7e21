import type { ReactNode } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { chemistryLabels, type Product } from '../../../../shared/schemas/product';
import { formatMinutes } from '../../../lib/durations';
import { formatNumber, formatQuantity } from '../../../lib/units-display';
import { DryingTimesTable } from './drying-times-table';
import { HazardWords } from './product-cells';
import { thinningRangeWords, upperFirst } from '../../../../shared/words';
import { mixRatioWords, productKindLabels } from './product-format';

const notGiven = <span className="text-maple-700">Not given</span>;

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="border-b border-maple-200 py-2">
      <dt className="text-sm font-medium text-maple-700">{term}</dt>
      <dd className="font-semibold">{children}</dd>
    </div>
  );
}

const maybe = (value: number | null, show: (value: number) => string) => (value === null ? notGiven : show(value));

/** The whole data sheet for those who read but do not edit it (sprayers). */
export function ProductSummary({ product, units }: { product: Product; units: UnitSystem }) {
  const temp = (c: number) => formatQuantity('temperature', c, units);
  return (
    <section aria-labelledby="summary-heading" className="space-y-4">
      <h2 id="summary-heading" className="text-xl font-semibold">
        Data sheet
      </h2>
      <dl className="grid gap-x-6 rounded-panel border border-maple-300 bg-white px-4 py-2 sm:grid-cols-2 xl:grid-cols-3">
        <Item term="Maker’s reference">{product.makerRef || notGiven}</Item>
        <Item term="Kind">{productKindLabels[product.kind]}</Item>
        <Item term="Chemistry">{chemistryLabels[product.chemistry]}</Item>
        <Item term="Volume solids">{formatNumber(product.volumeSolidsPct)} %</Item>
        <Item term="Density">{maybe(product.densityKgPerL, (v) => `${formatNumber(v, 2)} kg/L`)}</Item>
        <Item term="Dry film per coat">{maybe(product.dryFilmPerCoatUm, (v) => formatQuantity('filmThickness', v, units))}</Item>
        <Item term="Mix">{mixRatioWords(product.mixBaseParts, product.mixHardenerParts)}</Item>
        <Item term="Thinner">{upperFirst(thinningRangeWords(product))}</Item>
        <Item term="Induction time">{product.inductionMin === 0 ? 'None' : formatMinutes(product.inductionMin)}</Item>
        <Item term="Pot life">{maybe(product.potLifeMin, formatMinutes)}</Item>
        <Item term="Lowest application temperature">{maybe(product.minApplicationTempC, temp)}</Item>
        <Item term="Highest relative humidity">{maybe(product.maxRelativeHumidityPct, (v) => `${formatNumber(v)} %`)}</Item>
        <Item term="RH the times were measured at">{maybe(product.referenceRhPct, (v) => `${formatNumber(v)} %`)}</Item>
        <Item term="VOC as applied">{maybe(product.vocGPerL, (v) => formatQuantity('vocContent', v, units))}</Item>
        <Item term="Flash point">{maybe(product.flashPointC, temp)}</Item>
        <Item term="Price per litre">{maybe(product.pricePerL, (v) => formatNumber(v, 2))}</Item>
        <Item term="Hazards">
          <HazardWords hazards={product.hazards} />
        </Item>
      </dl>
      <h3 className="text-lg font-semibold">Drying times</h3>
      <DryingTimesTable rows={product.dryingTimes} />
    </section>
  );
}
