import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import type { ReadySummary, ReadySummaryPart } from '../../../../shared/schemas/ready';
import { formatShopClock, formatShopDate } from '../../../lib/shop-time';
import { livePollMs } from '../../../lib/use-live-updates';
import { useReadySummary } from '../../../api/ready/get-ready-summary';
import { LiveNote } from './live-note';
import { useBoardClock } from './use-board-clock';
import { WallJobCard } from './wall-job-card';
import { WallNextReady } from './wall-next-ready';

// What fits on one screen across the shop without scrolling.
const wallFits = { jobs: 6, next: 6 };

// A part whose handle time has passed is ready, not next: it leaves the list at once, not at the next answer.
const stillDrying = (part: ReadySummaryPart, now: Date) => part.handleAt === null || Date.parse(part.handleAt) > now.getTime();

function waitingLine(summary: ReadySummary): string {
  const named = summary.waitingJobs.map((job) => `${job.jobReference} (${job.parts})`).join(', ');
  const more = summary.waitingJobsCount - summary.waitingJobs.length;
  return more > 0 ? `${named} and ${more} more` : named;
}

function WallJobs({ summary }: { summary: ReadySummary }) {
  const extra = summary.jobsInFinish - summary.jobs.length;
  const waiting = waitingLine(summary);
  return (
    <div className="space-y-5">
      {summary.jobs.length === 0 ? (
        <p className="rounded-panel border-4 border-dashed border-maple-700 bg-white p-6 text-3xl font-semibold text-maple-900">
          Nothing in finish right now. Jobs show here once their first coat is logged.
        </p>
      ) : (
        <div className="grid gap-5 sm:grid-cols-[repeat(auto-fill,minmax(24rem,1fr))]">
          {summary.jobs.map((job) => (
            <WallJobCard key={job.jobId} job={job} />
          ))}
        </div>
      )}
      {extra > 0 && <p className="text-2xl font-semibold text-maple-900">And {extra} more {extra === 1 ? 'job' : 'jobs'} in finish: see the ready board.</p>}
      {waiting && <p className="text-2xl text-maple-900"><span className="font-semibold">Waiting for a first coat:</span> {waiting}</p>}
    </div>
  );
}

// The server's answer is cached until its change instant, so asking again this often costs it little.
const behindRetryMs = 5_000;

/**
 * An answer whose next change has already passed on this device came from a server clock that
 * runs behind it: ask again shortly, rather than show the old counts until the next slow poll.
 */
function useAskAgainWhileBehind(nextChangeAt: string | null, updatedAt: number, refetch: () => void) {
  const refetchRef = useRef(refetch);
  useEffect(() => {
    refetchRef.current = refetch;
  });
  useEffect(() => {
    if (nextChangeAt === null || Date.parse(nextChangeAt) > Date.now()) return;
    const timer = window.setTimeout(() => refetchRef.current(), behindRetryMs);
    return () => window.clearTimeout(timer);
  }, [nextChangeAt, updatedAt]);
}

/** The ready board for a screen on the workshop wall: no controls, large type, keeps itself current. */
export function WallBoard({ timeZone }: { timeZone: string }) {
  const ready = useReadySummary(wallFits);
  const summary = ready.data?.summary;
  // The counts change by themselves only at the answer's next change: ask the server again then.
  const now = useBoardClock(summary?.nextChangeAt ? [summary.nextChangeAt] : [], () => void ready.refetch());
  useAskAgainWhileBehind(summary?.nextChangeAt ?? null, ready.dataUpdatedAt, () => void ready.refetch());
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
        {summary ? (
          <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
            <WallJobs summary={summary} />
            <WallNextReady parts={summary.nextReady.filter((part) => stillDrying(part, now))} now={now} timeZone={timeZone} />
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
