import type { Plan, PlannedSession } from '../../../../shared/schemas/planner';
import { calendarDateWords, coatOfWords, denibWords, partsWords, shopMomentWords, shopSpanWords, upperFirst, type ShopFormat } from '../../../../shared/words';
import { useShopFormat } from '../../../api/settings/use-shop-format';

interface AutoPlanProposalProps {
  plan: Plan;
  timeZone: string;
  boothNames: Map<number, string>;
}

/** "Coat 2 of 3: Kestrel 2K PU Topcoat Satin", with the denib due before it on a line of its own. */
function CoatCell({ session }: { session: PlannedSession }) {
  return (
    <>
      <span className="font-semibold">{session.coatsTotal > 0 ? upperFirst(coatOfWords(session.coatNumber, session.coatsTotal)) : 'Coat'}</span>: {session.productName}
      {session.denibBeforeGrit && <span className="block text-maple-700">After a {denibWords(session.denibBeforeGrit)}</span>}
    </>
  );
}

const dueWords = (job: Plan['jobs'][number], shop: ShopFormat) =>
  `due ${calendarDateWords(job.dueDate, shop.locale)}${job.finishesAt ? `, ready to pack ${shopMomentWords(new Date(job.finishesAt), shop)}` : ''}`;

/** The proposed sessions, and for each job whether its due date is met and why not. */
export function AutoPlanProposal({ plan, timeZone, boothNames }: AutoPlanProposalProps) {
  const reference = new Map(plan.jobs.map((j) => [j.jobId, j.reference]));
  const shop = { ...useShopFormat(), timeZone };
  return (
    <div className="space-y-4">
      <ul className="space-y-2" aria-label="Jobs in the proposal">
        {plan.jobs.map((job) => (
          <li key={job.jobId} className="rounded-panel border border-maple-200 bg-white p-3">
            <p className="font-semibold">
              {job.reference}: {job.dueDateMet ? 'due date met' : 'due date NOT met'}
              <span className="font-normal text-maple-700"> ({dueWords(job, shop)})</span>
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
                    <CoatCell session={s} />
                  </td>
                  <td className="p-2">{boothNames.get(s.boothId) ?? '—'}</td>
                  <td className="p-2">{shopSpanWords(new Date(s.start), new Date(s.end), shop)}</td>
                  <td className="p-2">
                    {partsWords(s.partIds.length)}, {s.areaM2.toLocaleString(shop.locale, { maximumFractionDigits: 1, minimumFractionDigits: 1 })} m²
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
