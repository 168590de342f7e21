import { useState } from 'react';
import { toast } from 'sonner';
import type { Plan } from '../../../../shared/schemas/planner';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { errorMessage } from '../../../lib/error-messages';
import { useAcceptPlan } from '../../../api/planner/accept-plan';
import { usePlannableJobs } from '../api/get-plannable-jobs';
import { useProposePlan } from '../../../api/planner/propose-plan';
import { calendarDateWords } from '../../../../shared/words';
import { useShopFormat } from '../../../api/settings/use-shop-format';
import { AutoPlanProposal } from './auto-plan-proposal';

interface AutoPlanDialogProps {
  open: boolean;
  onClose: () => void;
  timeZone: string;
  boothNames: Map<number, string>;
  /** An admin looking at one site plans onto its booths only. */
  siteId?: number;
}

/** Choose jobs, see where their remaining coats would go, and book them all at once. */
export function AutoPlanDialog({ open, onClose, timeZone, boothNames, siteId }: AutoPlanDialogProps) {
  const jobs = usePlannableJobs(open);
  const { locale } = useShopFormat();
  const [chosen, setChosen] = useState<number[]>([]);
  const [plan, setPlan] = useState<Plan | null>(null);
  const propose = useProposePlan(siteId);
  const accept = useAcceptPlan();
  const toggle = (id: number) => setChosen((ids) => (ids.includes(id) ? ids.filter((x) => x !== id) : [...ids, id]));
  const close = () => {
    setPlan(null);
    setChosen([]);
    onClose();
  };
  const book = () =>
    plan &&
    accept.mutate(plan.sessions, {
      onSuccess: (items) => {
        toast.success(`Booked ${items.length} spray session${items.length === 1 ? '' : 's'}`);
        close();
      },
      onError: (error) => toast.error(errorMessage(error)),
    });

  return (
    <Dialog open={open} onClose={close} title="Auto-plan jobs" description="Boothwright proposes the remaining coats of the jobs you choose into free booth time; nothing is booked until you say so." wide>
      {jobs.isPending ? (
        <LoadingState what="the jobs" />
      ) : jobs.isError ? (
        <ErrorState error={jobs.error} what="the jobs" onRetry={() => jobs.refetch()} />
      ) : (
        <fieldset className="mb-4">
          <legend className="mb-2 font-semibold">Jobs to plan (none ticked: every open job)</legend>
          <div className="grid max-h-56 gap-1 overflow-y-auto sm:grid-cols-2">
            {jobs.data.map((job) => (
              <label key={job.id} className="flex min-h-touch items-center gap-2 rounded border border-maple-200 bg-white px-3">
                <input type="checkbox" checked={chosen.includes(job.id)} onChange={() => toggle(job.id)} className="size-5 shrink-0" />
                <span>
                  <strong>{job.reference}</strong> {job.customer} <span className="text-sm text-maple-600">due {calendarDateWords(job.dueDate, locale)}</span>
                </span>
              </label>
            ))}
          </div>
        </fieldset>
      )}
      <div className="mb-4 flex flex-wrap gap-2">
        <Button onClick={() => propose.mutate({ jobIds: chosen, horizonDays: 14 }, { onSuccess: setPlan, onError: (e) => toast.error(errorMessage(e)) })} pending={propose.isPending} pendingText="Working out a plan…">
          Propose a plan
        </Button>
        {plan && plan.sessions.length > 0 && (
          <Button onClick={book} pending={accept.isPending} pendingText="Booking…">
            {plan.sessions.length === 1 ? 'Book this session' : `Book all ${plan.sessions.length} sessions`}
          </Button>
        )}
      </div>
      {plan && <AutoPlanProposal plan={plan} timeZone={timeZone} boothNames={boothNames} />}
    </Dialog>
  );
}
