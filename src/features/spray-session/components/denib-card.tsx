import type { Denib } from '../../../../shared/schemas/denib';
import { denibWords, partLabelsWords, upperFirst } from '../../../../shared/words';
import { useNow } from '../../../lib/use-now';
import { shopWhen } from '../utils/session-format';

/** A denib in the session's record, between the coats it came between; marked apart from them. */
export function DenibCard({ denib, partLabel, timeZone }: { denib: Denib; partLabel: (id: number) => string; timeZone: string }) {
  const now = useNow(60_000);
  const parts = denib.partIds.map(partLabel);
  const when = shopWhen(denib.abradedAt, timeZone, now);
  return (
    <article aria-label={`${upperFirst(denibWords(denib.grit))}, ${partLabelsWords(parts)}, ${when}`} className="rounded-panel border-2 border-dashed border-maple-500 bg-maple-50 p-4">
      <h3 className="text-lg font-bold">
        <span className="mr-2 rounded-panel bg-maple-700 px-2 py-0.5 text-sm text-white">Denib</span>
        {denib.grit} · {when}
      </h3>
      <p className="text-maple-800">
        {parts.length === 1 ? parts[0] : `${parts.length} parts: ${parts.slice(0, 6).join(', ')}${parts.length > 6 ? '…' : ''}`} · by {denib.recordedByName}
      </p>
      {denib.notes && <p className="mt-1">{denib.notes}</p>}
    </article>
  );
}
