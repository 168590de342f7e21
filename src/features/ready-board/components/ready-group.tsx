import { useId, useState } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { ReadyJob } from '../../../../shared/schemas/ready';
import { jobReadyLines } from '../../../lib/ready-time-words';
import { Button } from '../../../components/ui/button';
import type { BoardGroup, GroupBy } from './board-groups';
import { countStates, countWords, type BoardPart } from './readiness';
import { ReadyPartCard } from './ready-part-card';

// A job can have eighty parts; the first dozen in board order hold what can be picked up soonest.
const firstShown = 12;

interface ReadyGroupProps {
  group: BoardGroup;
  groupBy: GroupBy;
  /** The group's job as a whole, when grouped by job: when it will be ready to handle and pack. */
  job?: ReadyJob;
  units: UnitSystem;
  now: Date;
  timeZone: string;
  onCollect?: (part: BoardPart) => void;
  collectingId: number | null;
  /** Only when several groups share the page; one group on its own shows every part. */
  collapsible: boolean;
}

function JobReadyTime({ job, now, timeZone, units }: { job: ReadyJob; now: Date; timeZone: string; units: UnitSystem }) {
  const { headline, details } = jobReadyLines(job, now, timeZone, units);
  return (
    <div className="mb-3 rounded-panel border border-lacquer-300 bg-white px-3 py-2" aria-label={`When ${job.jobReference} is ready`} role="group">
      <p className="font-semibold text-lacquer-900">{headline}</p>
      {details.map((line) => (
        <p key={line} className="text-sm text-maple-800">
          {line}
        </p>
      ))}
    </div>
  );
}

export function ReadyGroup({ group, groupBy, job, units, now, timeZone, onCollect, collectingId, collapsible }: ReadyGroupProps) {
  const [showAll, setShowAll] = useState(false);
  const headingId = useId();
  const listId = useId();
  const shown = showAll || !collapsible ? group.parts : group.parts.slice(0, firstShown);
  const hidden = group.parts.length - shown.length;
  return (
    <section aria-labelledby={headingId} className="rounded-panel border border-maple-300 bg-maple-50 p-3 sm:p-4">
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h2 id={headingId} className="text-xl font-bold text-lacquer-900">
          {group.title} {group.subtitle && <span className="font-medium text-maple-700">· {group.subtitle}</span>}
        </h2>
        <p className="text-sm font-medium text-maple-800">
          {group.parts.length} {group.parts.length === 1 ? 'part' : 'parts'}: {countWords(countStates(group.parts)).join(', ')}
        </p>
      </div>
      {job && <JobReadyTime job={job} now={now} timeZone={timeZone} units={units} />}
      <ul id={listId} className="grid gap-3 md:grid-cols-2 2xl:grid-cols-3">
        {shown.map((part) => (
          <ReadyPartCard key={part.id} part={part} now={now} timeZone={timeZone} groupBy={groupBy} onCollect={onCollect} collecting={collectingId === part.id} />
        ))}
      </ul>
      {collapsible && group.parts.length > firstShown && (
        <Button variant="quiet" className="mt-2" aria-controls={listId} aria-expanded={showAll} onClick={() => setShowAll((all) => !all)}>
          {showAll ? 'Show fewer parts' : `Show all ${group.parts.length} parts (${hidden} more)`}
        </Button>
      )}
    </section>
  );
}
