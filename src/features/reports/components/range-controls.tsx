import { FieldShell, inputClasses } from '../../../components/ui/field';
import { monthRange, quickRange, quickRangeLabels, wholeMonthOf, type DateRange, type QuickRangeId } from '../utils/report-range';

interface RangeControlsProps {
  range: DateRange;
  today: string;
  errors: { from?: string; to?: string };
  onChange: (range: DateRange) => void;
}

const quickIds = Object.keys(quickRangeLabels) as QuickRangeId[];
const same = (a: DateRange, b: DateRange) => a.from === b.from && a.to === b.to;

/** Quick picks for the usual periods, a month picker, and from/to for anything else (shop days, both included). */
export function RangeControls({ range, today, errors, onChange }: RangeControlsProps) {
  // A date box being cleared or half typed gives '': the range keeps its last whole date.
  const setDay = (end: keyof DateRange, value: string) => value && onChange({ ...range, [end]: value });
  return (
    <fieldset>
      <legend className="mb-1 font-medium">Date range</legend>
      <div className="flex flex-wrap items-end gap-3">
        <div role="group" aria-label="Quick ranges" className="flex flex-wrap gap-2">
          {quickIds.map((id) => {
            const pick = quickRange(id, today);
            return (
              <button
                key={id}
                type="button"
                aria-pressed={same(pick, range)}
                onClick={() => onChange(pick)}
                className={`min-h-touch whitespace-nowrap rounded-panel border-2 px-3 font-semibold ${same(pick, range) ? 'border-lacquer-700 bg-lacquer-50 text-lacquer-900' : 'border-maple-300 bg-white text-maple-900 hover:bg-maple-100'}`}
              >
                {quickRangeLabels[id]}
              </button>
            );
          })}
        </div>
        <div className="grid grow grid-cols-1 gap-3 sm:grid-cols-3 lg:max-w-xl">
          <FieldShell label="Month">
            {(control) => <input {...control} type="month" className={inputClasses} value={wholeMonthOf(range) ?? ''} onChange={(e) => e.target.value && onChange(monthRange(e.target.value))} />}
          </FieldShell>
          <FieldShell label="From" error={errors.from}>
            {(control) => <input {...control} type="date" className={inputClasses} value={range.from} onChange={(e) => setDay('from', e.target.value)} />}
          </FieldShell>
          <FieldShell label="To" error={errors.to}>
            {(control) => <input {...control} type="date" className={inputClasses} value={range.to} onChange={(e) => setDay('to', e.target.value)} />}
          </FieldShell>
        </div>
      </div>
    </fieldset>
  );
}
