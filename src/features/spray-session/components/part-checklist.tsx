import type { PickedPart } from '../utils/picked-part';

interface PartChecklistProps {
  parts: PickedPart[];
  chosen: number[];
  onChange: (chosen: number[]) => void;
  label: string;
}

/** Big tick boxes for a list of parts, with one button to take them all. */
export function PartChecklist({ parts, chosen, onChange, label }: PartChecklistProps) {
  if (parts.length === 0) return <p className="text-maple-700">No parts here.</p>;
  const toggle = (id: number) => onChange(chosen.includes(id) ? chosen.filter((c) => c !== id) : [...chosen, id]);
  const allChosen = parts.every((p) => chosen.includes(p.id));
  const setAll = () => onChange(allChosen ? chosen.filter((id) => !parts.some((p) => p.id === id)) : [...new Set([...chosen, ...parts.map((p) => p.id)])]);
  return (
    <fieldset>
      <legend className="sr-only">{label}</legend>
      <button type="button" onClick={setAll} className="mb-2 min-h-touch rounded-panel border-2 border-lacquer-700 bg-white px-4 font-semibold text-lacquer-800 hover:bg-lacquer-50">
        {allChosen ? `Untick all ${parts.length}` : `Tick all ${parts.length}`}
      </button>
      <div className="grid max-h-80 gap-2 overflow-y-auto p-1 sm:grid-cols-2 lg:grid-cols-3">
        {parts.map((part) => (
          <label
            key={part.id}
            className={`flex min-h-14 cursor-pointer items-center gap-3 rounded-panel border-2 px-3 py-2 has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-lacquer-500 ${chosen.includes(part.id) ? 'border-lacquer-700 bg-lacquer-50' : 'border-maple-300 bg-white'}`}
          >
            <input type="checkbox" className="size-6 shrink-0 accent-lacquer-700" checked={chosen.includes(part.id)} onChange={() => toggle(part.id)} />
            <span>
              <span className="block font-semibold">{part.label}</span>
              {part.progress && <span className="block text-sm text-maple-700">{part.progress}</span>}
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
