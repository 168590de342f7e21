import type { Plan } from '../../../../shared/schemas/planner';
import { calendarDateIn, wallClockIn } from '../../../../shared/time';

interface AutoPlanProposalProps {
  plan: Plan;
  timeZone: string;
  boothNames: Map<number, string>;
}

const when = (start: string, end: string, timeZone: string) =>
  `${calendarDateIn(new Date(start), timeZone)} ${wallClockIn(new Date(start), timeZone).time}–${wallClockIn(new Date(end), timeZone).time}`;

/** The proposed sessions, and for each job whether its due date is met and why not. */
export function AutoPlanProposal({ plan, timeZone, boothNames }: AutoPlanProposalProps) {
  const reference = new Map(plan.jobs.map((j) => [j.jobId, j.reference]));
  return (
    <div className="space-y-4">
      <ul className="space-y-2" aria-label="Jobs in the proposal">
        {plan.jobs.map((job) => (
          <li key={job.jobId} className="rounded-panel border border-maple-200 bg-white p-3">
            <p className="font-semibold">
              {job.reference}: {job.dueDateMet ? 'due date met' : 'due date NOT met'}
              <span className="font-normal text-maple-700">
                {' '}
                (due {job.dueDate}
                {job.finishesAt ? `, ready to pack ${calendarDateIn(new Date(job.finishesAt), timeZone)} ${wallClockIn(new Date(job.finishesAt), timeZone).time}` : ''})
              </span>
            </p>
            {job.notes.map((note) => (
              <p key={note} className="text-sm text-verdict-caution">
                {note}
              </p>
            ))}
          </li>
        ))}
      </ul>
      {plan.sessions.length === 0 ? (
        <p>Nothing to book: every chosen job is finished, already booked, or could not be fitted (see above).</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Proposed spray sessions</caption>
            <thead>
              <tr className="border-b border-maple-300">
                <th className="p-2">Job</th>
                <th className="p-2">Coat</th>
                <th className="p-2">Booth</th>
                <th className="p-2">When (shop time)</th>
                <th className="p-2">Parts</th>
              </tr>
            </thead>
            <tbody>
              {plan.sessions.map((s) => (
                <tr key={`${s.jobId}-${s.stepPosition}`} className="border-b border-maple-200">
                  <td className="p-2">{reference.get(s.jobId)}</td>
                  <td className="p-2">
                    Step {s.stepPosition + 1}: {s.productName}
                  </td>
                  <td className="p-2">{boothNames.get(s.boothId) ?? `Booth ${s.boothId}`}</td>
                  <td className="p-2">{when(s.start, s.end, timeZone)}</td>
                  <td className="p-2">
                    {s.partIds.length} {s.partIds.length === 1 ? 'part' : 'parts'}, {s.areaM2.toFixed(1)} m²
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
