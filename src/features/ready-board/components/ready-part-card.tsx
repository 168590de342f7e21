import { Button } from '../../../components/ui/button';
import { placeWords, type GroupBy } from './board-groups';
import { coatWords, partLines } from './readiness-words';
import { pickUpStates, type BoardPart } from './readiness';
import { ReadyStateBadge } from './ready-state-badge';

interface ReadyPartCardProps {
  part: BoardPart;
  now: Date;
  timeZone: string;
  groupBy: GroupBy;
  onCollect?: (part: BoardPart) => void;
  collecting: boolean;
}

export function ReadyPartCard({ part, now, timeZone, groupBy, onCollect, collecting }: ReadyPartCardProps) {
  const { headline, details } = partLines(part, now, timeZone);
  const canPickUp = pickUpStates.has(part.shownState);
  return (
    <li className={`flex flex-col gap-3 rounded-panel border bg-white p-3 ${canPickUp ? 'border-verdict-go' : 'border-maple-300'}`} aria-label={`${part.label}, ${part.jobReference}`}>
      <div className="min-w-0 flex-1">
        <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
          <h3 className="text-lg font-bold text-maple-900">{part.label}</h3>
          <ReadyStateBadge state={part.shownState} />
        </div>
        <p className="mt-1 text-sm font-medium text-maple-700">
          {coatWords(part)} · {placeWords(part, groupBy)}
        </p>
        <p className="mt-2 font-semibold text-lacquer-900">{headline}</p>
        {details.length > 0 && (
          <ul className="mt-1 space-y-0.5 text-sm text-maple-800">
            {details.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        )}
      </div>
      {onCollect && canPickUp && (
        <Button variant="secondary" className="self-start" pending={collecting} pendingText="Marking…" onClick={() => onCollect(part)}>
          Mark collected<span className="sr-only"> for {part.label}</span>
        </Button>
      )}
    </li>
  );
}
