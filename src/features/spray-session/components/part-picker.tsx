import { useState } from 'react';
import type { PickedPart } from '../utils/picked-part';
import { PartChecklist } from './part-checklist';
import { PartsByJob, PartsByRack } from './parts-by-source';
import { TagEntry } from './tag-entry';

type Source = 'planned' | 'job' | 'rack' | 'tag';
const sources: { id: Source; label: string }[] = [
  { id: 'planned', label: 'Planned parts' },
  { id: 'job', label: 'By job' },
  { id: 'rack', label: 'By rack' },
  { id: 'tag', label: 'Scan or type a tag' },
];

interface PartPickerProps {
  chosen: number[];
  known: Map<number, PickedPart>;
  planned: PickedPart[];
  /** The new choice, and any parts it names that were not known before. */
  onChange: (chosen: number[], parts: PickedPart[]) => void;
  error?: string;
}

export function PartPicker({ chosen, known, planned, onChange, error }: PartPickerProps) {
  const [source, setSource] = useState<Source>(planned.length > 0 ? 'planned' : 'tag');
  const chosenParts = chosen.map((id) => known.get(id) ?? { id, label: `Part ${id}`, jobId: 0, rackId: null });
  return (
    <fieldset className="space-y-3">
      <legend className="text-lg font-semibold">
        Parts in this coat <span className="font-normal text-maple-700">({chosen.length} chosen)</span>
      </legend>
      {chosenParts.length > 0 ? (
        <ul aria-label="Chosen parts" className="flex flex-wrap gap-2">
          {chosenParts.map((part) => (
            <li key={part.id}>
              <button
                type="button"
                onClick={() => onChange(chosen.filter((id) => id !== part.id), [])}
                aria-label={`Remove ${part.label}`}
                className="inline-flex min-h-touch items-center gap-2 rounded-full border-2 border-lacquer-700 bg-lacquer-50 px-4 font-semibold text-lacquer-900 hover:bg-lacquer-100"
              >
                {part.label} <span aria-hidden="true">✕</span>
              </button>
            </li>
          ))}
        </ul>
      ) : (
        <p className="font-medium text-verdict-stop">No parts chosen yet.</p>
      )}
      {error && (
        <p className="text-sm font-medium text-verdict-stop">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
      <div role="group" aria-label="Choose parts from" className="flex flex-wrap gap-2">
        {sources.map((s) => (
          <button
            key={s.id}
            type="button"
            aria-pressed={source === s.id}
            onClick={() => setSource(s.id)}
            className={`min-h-touch rounded-panel border-2 px-4 font-semibold ${source === s.id ? 'border-lacquer-800 bg-lacquer-800 text-white' : 'border-maple-400 bg-white text-maple-900 hover:bg-maple-100'}`}
          >
            {s.label}
          </button>
        ))}
      </div>
      <div className="rounded-panel border border-maple-300 bg-maple-50 p-3">
        {source === 'planned' && <PartChecklist parts={planned} chosen={chosen} onChange={(next) => onChange(next, [])} label="Planned parts" />}
        {source === 'job' && <PartsByJob chosen={chosen} onChange={onChange} />}
        {source === 'rack' && <PartsByRack chosen={chosen} onChange={onChange} />}
        {source === 'tag' && <TagEntry onFound={(part) => onChange(chosen.includes(part.id) ? chosen : [...chosen, part.id], [part])} />}
      </div>
    </fieldset>
  );
}
