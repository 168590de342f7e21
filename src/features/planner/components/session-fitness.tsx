import { FitnessFindings } from '../../../components/safety/fitness-findings';
import { useSessionFitness } from '../../../api/spray-sessions/get-session-fitness';

/** Before the session: is the booth kept up and is the assigned sprayer's protection in date, for what its products need. */
export function SessionFitness({ spraySessionId, enabled }: { spraySessionId: number; enabled: boolean }) {
  const fitness = useSessionFitness(spraySessionId, enabled);
  if (!enabled) return null;
  if (fitness.isPending) return <p role="status" className="mt-4 text-maple-700">Checking the booth’s upkeep and the sprayer’s records…</p>;
  if (fitness.isError) return <p className="mt-4 font-medium text-verdict-caution">The booth’s upkeep and the sprayer’s records could not be checked just now; the pre-spray checks will.</p>;
  const { byRespirator, neededRespirator, crewShown, deferLine } = fitness.data;
  const fit = byRespirator[neededRespirator];
  return (
    <div className="mt-4">
      <FitnessFindings verdict={fit.verdict} findings={fit.findings} crewShown={crewShown} deferLine={deferLine} />
    </div>
  );
}
