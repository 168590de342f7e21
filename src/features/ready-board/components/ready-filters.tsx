import { useId } from 'react';
import { readinessStates } from '../../../../shared/finishing/readiness';
import { inputClasses } from '../../../components/ui/field';
import type { JobChoice, RackChoice } from './use-ready-choices';
import type { BoardFilters, StateFilter } from './board-filters';
import type { GroupBy } from './board-groups';
import { stateLabels } from './readiness';

interface ReadyFiltersProps {
  filters: BoardFilters;
  jobs: JobChoice[];
  racks: RackChoice[];
  onChange: (filters: BoardFilters) => void;
}

const idOrUndefined = (value: string) => (value ? Number(value) : undefined);

function GroupToggle({ value, onChange }: { value: GroupBy; onChange: (group: GroupBy) => void }) {
  const option = (group: GroupBy, label: string) => (
    <button
      type="button"
      aria-pressed={value === group}
      onClick={() => onChange(group)}
      className={`min-h-touch flex-1 whitespace-nowrap px-4 font-semibold ${value === group ? 'bg-lacquer-700 text-white' : 'bg-white text-maple-900 hover:bg-maple-100'}`}
    >
      {label}
    </button>
  );
  return (
    <div role="group" aria-label="Group parts" className="flex overflow-hidden rounded-panel border border-maple-400">
      {option('job', 'By job')}
      {option('rack', 'By rack')}
    </div>
  );
}

export function ReadyFilters({ filters, jobs, racks, onChange }: ReadyFiltersProps) {
  const ids = { job: useId(), rack: useId(), state: useId() };
  const select = (id: string, label: string, value: string | number | undefined, change: (value: string) => void, options: [string, string][]) => (
    <div>
      <label htmlFor={id} className="mb-1 block font-medium">
        {label}
      </label>
      <select id={id} className={inputClasses} value={value ?? ''} onChange={(event) => change(event.target.value)}>
        {options.map(([optionValue, text]) => (
          <option key={optionValue} value={optionValue}>
            {text}
          </option>
        ))}
      </select>
    </div>
  );
  return (
    <div role="search" aria-label="Ready board filters" className="grid gap-3 sm:grid-cols-2 sm:items-end xl:grid-cols-[2fr_1.5fr_1.5fr_auto]">
      {select(ids.job, 'Job', filters.jobId, (v) => onChange({ ...filters, jobId: idOrUndefined(v) }), [['', 'All jobs'], ...jobs.map((j): [string, string] => [String(j.id), `${j.reference} · ${j.customer}`])])}
      {select(ids.rack, 'Rack', filters.rackId, (v) => onChange({ ...filters, rackId: idOrUndefined(v) }), [['', 'All racks'], ...racks.map((r): [string, string] => [String(r.id), r.name])])}
      {select(ids.state, 'State', filters.state, (v) => onChange({ ...filters, state: v as StateFilter }), [
        ['', 'All but collected'],
        ...readinessStates.map((s): [string, string] => [s, stateLabels[s]]),
        ['any', 'Every state, collected too'],
      ])}
      <GroupToggle value={filters.group} onChange={(group) => onChange({ ...filters, group })} />
    </div>
  );
}
