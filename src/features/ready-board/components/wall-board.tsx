import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { formatShopClock, formatShopDate } from '../../../lib/shop-time';
import { livePollMs } from '../../../lib/use-live-updates';
import { useReady } from '../../../api/ready/get-ready';
import { LiveNote } from './live-note';
import { toBoardPart, upcomingInstants } from './readiness';
import { useBoardClock } from './use-board-clock';
import { WallJobCard } from './wall-job-card';
import { WallNextReady } from './wall-next-ready';
import { summariseForWall, type WallSummary } from './wall-summary';

// What fits on one screen across the shop without scrolling.
const maxJobCards = 6;
const nextCount = 6;

function WallJobs({ summary }: { summary: WallSummary }) {
  const extra = summary.activeJobs.length - maxJobCards;
  const waiting = summary.waitingJobs.map((job) => `${job.reference} (${job.parts})`).join(', ');
  return (
    <div className="space-y-5">
      {summary.activeJobs.length === 0 ? (
        <p className="rounded-panel border-4 border-dashed border-maple-700 bg-white p-6 text-3xl font-semibold text-maple-900">
          Nothing in finish right now. Jobs show here once their first coat is logged.
        </p>
      ) : (
        <div className="grid gap-5 sm:grid-cols-[repeat(auto-fill,minmax(24rem,1fr))]">
          {summary.activeJobs.slice(0, maxJobCards).map((job) => (
            <WallJobCard key={job.jobId} job={job} />
          ))}
        </div>
      )}
      {extra > 0 && <p className="text-2xl font-semibold text-maple-900">And {extra} more {extra === 1 ? 'job' : 'jobs'} in finish: see the ready board.</p>}
      {waiting && <p className="text-2xl text-maple-900"><span className="font-semibold">Waiting for a first coat:</span> {waiting}</p>}
    </div>
  );
}

/** The ready board for a screen on the workshop wall: no controls, large type, keeps itself current. */
export function WallBoard({ timeZone }: { timeZone: string }) {
  // Polls in the background too: a wall screen is often an unfocused window.
  const ready = useReady({}, { inBackground: true });
  const items = ready.data?.items;
  const now = useBoardClock(upcomingInstants(items ?? []), () => void ready.refetch());
  const summary = useMemo(() => summariseForWall((items ?? []).map((part) => toBoardPart(part, now)), nextCount), [items, now]);
  return (
    <div className="min-h-dvh bg-maple-50 p-4 text-maple-900 sm:p-8">
      <header className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b-4 border-maple-900 pb-4">
        <div>
          <h1 className="text-4xl font-bold sm:text-5xl">Ready board</h1>
          <LiveNote className="mt-2 text-xl" failing={ready.isError} updatedAt={ready.dataUpdatedAt} timeZone={timeZone} />
        </div>
        <div className="text-right">
          <p className="text-5xl font-bold tabular-nums sm:text-6xl">{formatShopClock(now, timeZone)}</p>
          <p className="text-xl">{formatShopDate(now, timeZone)}</p>
          <Link to="/ready" className="text-base text-maple-800 underline underline-offset-4">
            Leave wall screen
          </Link>
        </div>
      </header>
      <main>
        {ready.data ? (
          <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
            <WallJobs summary={summary} />
            <WallNextReady parts={summary.nextReady} now={now} timeZone={timeZone} />
          </div>
        ) : (
          <p role={ready.isError ? 'alert' : 'status'} className="text-3xl font-semibold">
            {ready.isError ? `Cannot reach Boothwright yet. Trying again every ${livePollMs / 1000} s.` : 'Loading the ready board…'}
          </p>
        )}
      </main>
    </div>
  );
}
