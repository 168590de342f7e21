import { useMemo } from 'react';
import type { LeadBoard as LeadBoardData } from '../../../../shared/schemas/today';
import { boothIdentities } from '../../../lib/booth-identity';
import { DenibWaiting, JobsAtRisk, RecoatClosing, StaleSensors } from './attention-lists';
import { BoothDayCard } from './booth-day-card';
import { UpkeepDueList } from './upkeep-due-list';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The sentence at the top: how the day stands, so a glance says whether anything needs the lead. */
function DaySummary({ board }: { board: LeadBoardData }) {
  const today = board.sessions.filter((s) => s.date === board.today);
  const unassigned = board.sessions.filter((s) => s.sprayerId === null && (s.state === 'planned' || s.state === 'checking'));
  const facts = [
    today.length ? plural(today.length, 'session today', 'sessions today') : 'No sessions booked today',
    ...(unassigned.length ? [plural(unassigned.length, 'session without a sprayer', 'sessions without a sprayer')] : board.sessions.length ? ['every session has a sprayer'] : []),
    board.recoatClosing.length ? plural(board.recoatClosing.length, 'recoat window closing', 'recoat windows closing') : 'no recoat window closes today',
    board.jobsAtRisk.length ? plural(board.jobsAtRisk.length, 'job at risk', 'jobs at risk') : 'no job at risk',
  ];
  return (
    <p role="status" className="rounded-panel border border-lacquer-200 bg-lacquer-50 px-4 py-3 text-lg">
      {facts.join(' · ')}
    </p>
  );
}

/** A lead's day: every booth today and tomorrow with its sprayers, then what needs acting on. */
export function LeadBoard({ board, timeZone }: { board: LeadBoardData; timeZone: string }) {
  const identities = useMemo(() => boothIdentities(board.booths.map((b) => b.id)), [board.booths]);
  const days = (boothId: number) => [
    { date: board.today, label: 'Today', sessions: board.sessions.filter((s) => s.boothId === boothId && s.date === board.today) },
    { date: board.tomorrow, label: 'Tomorrow', sessions: board.sessions.filter((s) => s.boothId === boothId && s.date === board.tomorrow) },
  ];
  return (
    <div className="space-y-6">
      <DaySummary board={board} />
      <section aria-labelledby="today-booths" className="space-y-3">
        <h2 id="today-booths" className="text-xl font-semibold text-lacquer-900">
          Booths, today and tomorrow
        </h2>
        {board.booths.length === 0 && <p className="text-maple-700">No booths at this site yet; add them under Booths.</p>}
        {board.booths.map((booth) => (
          <BoothDayCard key={booth.id} booth={booth} identity={identities.get(booth.id)} days={days(booth.id)} sprayers={board.sprayers} timeZone={timeZone} />
        ))}
      </section>
      <div className="grid gap-4 lg:grid-cols-2">
        <RecoatClosing items={board.recoatClosing} timeZone={timeZone} today={board.today} />
        <JobsAtRisk items={board.jobsAtRisk} />
        <DenibWaiting items={board.denibWaiting} />
        <StaleSensors items={board.staleSensors} timeZone={timeZone} />
        <UpkeepDueList due={board.upkeepDue} />
      </div>
    </div>
  );
}
