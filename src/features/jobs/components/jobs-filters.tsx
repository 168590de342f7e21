import { useEffect, useId, useState } from 'react';
import { inputClasses } from '../../../components/ui/field';
import { jobStateFilterOptions, type JobStateFilter } from './job-format';

interface JobsFiltersProps {
  q: string;
  state: JobStateFilter;
  onChange: (filters: { q: string; state: JobStateFilter }) => void;
}

/** Search as you type, but only ask the server once typing pauses. */
export function JobsFilters({ q, state, onChange }: JobsFiltersProps) {
  const [text, setText] = useState(q);
  const searchId = useId();
  const stateId = useId();

  useEffect(() => {
    if (text.trim() === q) return;
    const timer = window.setTimeout(() => onChange({ q: text.trim(), state }), 300);
    return () => window.clearTimeout(timer);
  }, [text, q, state, onChange]);

  return (
    <form role="search" aria-label="Jobs" className="grid gap-3 sm:grid-cols-[2fr_1fr]" onSubmit={(event) => {
      event.preventDefault();
      onChange({ q: text.trim(), state });
    }}>
      <div>
        <label htmlFor={searchId} className="mb-1 block font-medium">
          Search jobs
        </label>
        <input id={searchId} type="search" className={inputClasses} placeholder="Reference or customer" value={text} onChange={(event) => setText(event.target.value)} />
      </div>
      <div>
        <label htmlFor={stateId} className="mb-1 block font-medium">
          State
        </label>
        <select id={stateId} className={inputClasses} value={state} onChange={(event) => onChange({ q: text.trim(), state: event.target.value as JobStateFilter })}>
          {jobStateFilterOptions.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      </div>
    </form>
  );
}
