import { useId } from 'react';
import type { Booth } from '../../../../shared/schemas/booth';
import { Button } from '../../../components/ui/button';
import { inputClasses } from '../../../components/ui/field';
import type { PlannerView } from '../utils/calendar-range';

export type BoothFilter = number | 'all';

interface PlannerToolbarProps {
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
    </div>
  );
}
