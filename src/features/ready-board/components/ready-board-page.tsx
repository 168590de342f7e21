import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { ReadyJob, ReadyPart } from '../../../../shared/schemas/ready';
import { Button, buttonClasses } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useReadyChoices } from './use-ready-choices';
import { useReady } from '../../../api/ready/get-ready';
import { matchesState, useBoardFilters, type BoardFilters } from './board-filters';
import { groupByJob, groupByRack } from './board-groups';
import { LiveNote } from './live-note';
import { countStates, toBoardPart, upcomingInstants, type BoardPart } from './readiness';
import { ReadyAnnouncer } from './ready-announcer';
import { ReadyFilters } from './ready-filters';
import { ReadyGroup } from './ready-group';
import { useBoardClock } from './use-board-clock';
import { useCollectWithUndo } from './use-collect-with-undo';

interface BoardBodyProps {
  items: ReadyPart[];
  jobs: ReadyJob[];
  units: UnitSystem;
  filters: BoardFilters;
  onFilters: (filters: BoardFilters) => void;
  now: Date;
  timeZone: string;
  canCollect: boolean;
}

function BoardBody({ items, jobs, units, filters, onFilters, now, timeZone, canCollect }: BoardBodyProps) {
  const { markCollected, pendingId } = useCollectWithUndo();
  const parts = useMemo(() => items.map((part) => toBoardPart(part, now)), [items, now]);
  const shown = parts.filter(matchesState(filters.state));
  const groups = filters.group === 'rack' ? groupByRack(shown) : groupByJob(shown);
  const onCollect = canCollect ? (part: BoardPart) => void markCollected(part) : undefined;
  if (shown.length === 0) return <BoardEmpty parts={parts} filters={filters} onFilters={onFilters} />;
  return (
    <div className="space-y-5">
      <ReadyAnnouncer counts={countStates(shown)} />
      {groups.map((group) => (
        <ReadyGroup
          key={group.key}
          group={group}
          groupBy={filters.group}
          job={filters.group === 'job' ? jobs.find((job) => job.jobId === group.parts[0].jobId) : undefined}
          units={units}
          now={now}
          timeZone={timeZone}
          onCollect={onCollect}
          collectingId={pendingId}
          collapsible={groups.length > 1}
        />
      ))}
    </div>
  );
}

function BoardEmpty({ parts, filters, onFilters }: { parts: BoardPart[]; filters: BoardFilters; onFilters: (filters: BoardFilters) => void }) {
  const filtered = Boolean(filters.jobId || filters.rackId || filters.state);
  if (!filtered) {
    return (
      <EmptyState title="Nothing on the board yet">
        Parts show here as soon as a job has them: each with its coats so far, the next recoat window, and live countdowns to when it can be handled, packed
        and when it is fully cured.
      </EmptyState>
    );
  }
  const allCollected = parts.length > 0 && filters.state === '';
  return (
    <EmptyState title={allCollected ? 'Every part here has been collected' : 'No parts match these filters'}>
      <p>{allCollected ? `All ${parts.length} parts are off the racks.` : 'Try another job, rack or state.'}</p>
      <div className="mt-3 flex flex-wrap gap-3">
        {allCollected && (
          <Button variant="secondary" onClick={() => onFilters({ ...filters, state: 'any' })}>
            Show collected parts
          </Button>
        )}
        <Button variant="secondary" onClick={() => onFilters({ state: '', group: filters.group })}>
          Clear filters
        </Button>
      </div>
    </EmptyState>
  );
}

// Asked to show collected parts, the board reaches back a month rather than the usual week.
const collectedShownDays = 30;

export function ReadyBoardPage({ timeZone, units, canCollect }: { timeZone: string; units: UnitSystem; canCollect: boolean }) {
  const [filters, setFilters] = useBoardFilters();
  const showsCollected = filters.state === 'any' || filters.state === 'collected';
  const ready = useReady({ jobId: filters.jobId, rackId: filters.rackId, ...(showsCollected ? { collectedDays: collectedShownDays } : {}) });
  const { jobs, racks } = useReadyChoices();
  const now = useBoardClock(upcomingInstants(ready.data?.items ?? []), () => void ready.refetch());
  return (
    <>
      <PageHeader
        title="Ready board"
        description="Every part, by job or by rack: its coats so far, what is next, and when it can be handled and packed. Each job says when the whole job will be ready."
        actions={
          <Link to="/ready/wall" className={buttonClasses('secondary')}>
            Wall screen
          </Link>
        }
      />
      <ReadyFilters filters={filters} jobs={jobs} racks={racks} onChange={setFilters} />
      <LiveNote className="mt-3 mb-4 text-sm" failing={ready.isError} updatedAt={ready.dataUpdatedAt} timeZone={timeZone} />
      {ready.data ? (
        <BoardBody items={ready.data.items} jobs={ready.data.jobs} units={units} filters={filters} onFilters={setFilters} now={now} timeZone={timeZone} canCollect={canCollect} />
      ) : ready.isError ? (
        <ErrorState error={ready.error} what="the ready board" onRetry={() => ready.refetch()} />
      ) : (
        <LoadingState what="the ready board" />
      )}
    </>
  );
}
