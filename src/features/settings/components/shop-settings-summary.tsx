import type { UnitSystem } from '../../../../shared/schemas/common';
import type { ShopSettings } from '../../../../shared/schemas/settings';
import { formatNumber, formatQuantity } from '../../../lib/units-display';
import { choiceLabel, currencyChoices, localeChoices } from './shop-format-options';

/** What roles without `settings:write` see: the same facts, read-only. */
export function ShopSettingsSummary({ settings, units }: { settings: ShopSettings; units: UnitSystem }) {
  const rows: [string, string][] = [
    ['Shop name', settings.shopName],
    ['Timezone', settings.timezone],
    ['Language and region', choiceLabel(localeChoices, settings.locale)],
    ['Currency', choiceLabel(currencyChoices, settings.currency)],
    ['Units for new users', settings.defaultUnits === 'us' ? 'US customary' : 'Metric'],
    ['Expected drying temperature', formatQuantity('temperature', settings.planningDryingTempC, units)],
    ['Set-up per spray session', `${settings.setupMin} min`],
    ['Clean-down per spray session', `${settings.cleanDownMin} min`],
    ['Yearly solvent threshold', `${formatNumber(settings.yearlySolventThresholdKg, 0)} kg`],
    ['Daily plan sent at', `${String(settings.dailyPlanHour).padStart(2, '0')}:00`],
    ['Extraction test every', `${settings.extractionTestMonths} months`],
    ['Fire-protection inspection every', `${settings.fireInspectionMonths} months`],
    ['Face-fit test every', `${settings.fitTestMonths} months`],
    ['Health surveillance every', `${settings.healthSurveillanceMonths} months`],
    ['Upkeep warnings', `${settings.upkeepDueSoonDays} days ahead`],
  ];
  return (
    <dl className="grid max-w-3xl gap-x-6 gap-y-3 rounded-panel border border-maple-300 bg-white p-4 sm:grid-cols-[auto_1fr]">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="font-medium text-maple-700">{term}</dt>
          <dd className="font-semibold">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
