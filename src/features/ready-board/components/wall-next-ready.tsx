import type { ReadySummaryPart } from '../../../../shared/schemas/ready';
import { shopMoment, timeUntil } from './readiness-words';

/** The parts that will be ready to handle soonest, with the time and where they sit. */
export function WallNextReady({ parts, now, timeZone }: { parts: ReadySummaryPart[]; now: Date; timeZone: string }) {
  return (
    <section aria-labelledby="wall-next" className="rounded-panel border-4 border-maple-900 bg-white p-5">
      <h2 id="wall-next" className="mb-3 text-3xl font-bold text-maple-900">
        Next ready to handle
      </h2>
      {parts.length === 0 ? (
        <p className="text-2xl text-maple-800">No parts drying after their last coat.</p>
      ) : (
        <ol className="divide-y-2 divide-maple-300">
          {parts.map((part) => (
            <li key={part.id} className="py-3">
              <p className="flex flex-wrap items-baseline justify-between gap-x-3 text-2xl">
                <span className="font-bold text-maple-900">{part.label}</span>
                {part.handleAt && (
                  <span className="font-bold tabular-nums text-maple-900">
                    {shopMoment(part.handleAt, now, timeZone)} <span className="font-medium">(in {timeUntil(part.handleAt, now)})</span>
                  </span>
                )}
              </p>
              <p className="text-xl text-maple-800">
                {part.jobReference}
                {part.rack ? ` · ${part.rack.name}${part.rack.shelf != null ? `, shelf ${part.rack.shelf}` : ''}` : ''}
              </p>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
