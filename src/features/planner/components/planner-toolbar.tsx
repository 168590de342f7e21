import { useId } from 'react';
import type { Booth } from '../../../../shared/schemas/booth';
import { BoothMark } from '../../../components/ui/booth-mark';
import { Button } from '../../../components/ui/button';
import type { BoothIdentity } from '../../../lib/booth-identity';
import { inputClasses } from '../../../components/ui/field';
import type { PlannerView } from '../utils/calendar-range';

export type BoothFilter = number | 'all';

interface PlannerToolbarProps {
  identities: Map<number, BoothIdentity>;
  view: PlannerView;
  weekAllowed: boolean;
  day: string;
  booths: Booth[];
  boothFilter: BoothFilter;
  showCancelled: boolean;
  onView: (view: PlannerView) => void;
  onStep: (direction: 1 | -1) => void;
  onToday: () => void;
  onDay: (day: string) => void;
  onBoothFilter: (filter: BoothFilter) => void;
  onShowCancelled: (show: boolean) => void;
}

function ViewToggle({ view, weekAllowed, onView }: Pick<PlannerToolbarProps, 'view' | 'weekAllowed' | 'onView'>) {
  if (!weekAllowed) return <p className="text-sm text-maple-700">Day view on a narrow screen; turn the tablet or widen the window for the week.</p>;
  return (
    <div role="group" aria-label="Calendar view" className="flex">
      {(['week', 'day'] as const).map((option) => (
        <Button
          key={option}
          variant={view === option ? 'primary' : 'secondary'}
          aria-pressed={view === option}
          className="first:rounded-r-none last:rounded-l-none"
          onClick={() => onView(option)}
        >
          {option === 'week' ? 'Week' : 'Day'}
        </Button>
      ))}
    </div>
  );
}

/** Which band marks which booth; the blocks repeat the booth's name too. */
function BoothKey({ booths, identities }: { booths: Booth[]; identities: Map<number, BoothIdentity> }) {
  if (booths.length < 2) return null;
  return (
    <ul aria-label="Booths on the calendar" className="flex basis-full flex-wrap gap-x-4 gap-y-1 text-sm">
      {booths.map((booth) => (
        <li key={booth.id} className="flex items-center gap-1.5">
          <BoothMark identity={identities.get(booth.id)} className="h-4 w-3" />
          <span>{booth.name}</span>
        </li>
      ))}
    </ul>
  );
}

/** Moving through the calendar and choosing what it shows; real buttons and labelled controls. */
export function PlannerToolbar(props: PlannerToolbarProps) {
  const { view, day, booths, boothFilter, showCancelled } = props;
  const dayId = useId();
  const boothId = useId();
  const unit = view === 'week' ? 'week' : 'day';
  return (
    <div className="mb-3 flex flex-wrap items-end gap-3">
      <div role="group" aria-label="Move through the calendar" className="flex flex-wrap gap-2">
        <Button variant="secondary" onClick={() => props.onStep(-1)}>
          <span aria-hidden="true">←</span> Previous {unit}
        </Button>
        <Button variant="secondary" onClick={props.onToday}>
          Today
        </Button>
        <Button variant="secondary" onClick={() => props.onStep(1)}>
          Next {unit} <span aria-hidden="true">→</span>
        </Button>
      </div>
      <ViewToggle view={view} weekAllowed={props.weekAllowed} onView={props.onView} />
      <div>
        <label htmlFor={dayId} className="mb-1 block text-sm font-medium">
          Go to day
        </label>
        <input id={dayId} type="date" className={inputClasses} value={day} onChange={(event) => event.target.value && props.onDay(event.target.value)} />
      </div>
      <div>
        <label htmlFor={boothId} className="mb-1 block text-sm font-medium">
          Booth
        </label>
        <select
          id={boothId}
          className={inputClasses}
          value={String(boothFilter)}
          onChange={(event) => props.onBoothFilter(event.target.value === 'all' ? 'all' : Number(event.target.value))}
        >
          <option value="all">All booths</option>
          {booths.map((booth) => (
            <option key={booth.id} value={booth.id}>
              {booth.name}
            </option>
          ))}
        </select>
      </div>
      <label className="flex min-h-touch items-center gap-2">
        <input type="checkbox" className="size-5 accent-lacquer-700" checked={showCancelled} onChange={(event) => props.onShowCancelled(event.target.checked)} />
        Show cancelled sessions
      </label>
      <BoothKey booths={booths} identities={props.identities} />
    </div>
  );
}
