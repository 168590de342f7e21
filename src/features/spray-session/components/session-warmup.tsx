import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useBooth } from '../../../api/booths/get-booth';
import { useMixes } from '../../../api/mixes/get-mixes';
import { useRacks } from '../../../api/racks/get-racks';
import { useLatestReading } from '../../../api/readings/get-readings';
import { useSessionFitness } from '../../../api/spray-sessions/get-session-fitness';
import { useSpraySession } from '../../../api/spray-sessions/get-spray-session';
import { useOnline } from '../../../lib/use-online';
import { useSessionRecords } from '../hooks/use-session-records';
import { useSessionPlan } from '../hooks/use-session-plan';

/**
 * Reads what the session page reads, with the same queries (so the same addresses): the service
 * worker keeps each answer, and the page opens with no network though it was never opened here.
 */
function SessionWarmup({ session }: { session: SpraySession }) {
  useSpraySession(session.id);
  useBooth(session.boothId);
  useSessionPlan(session);
  useSessionRecords(session.id);
  useMixes(session.id);
  useLatestReading(session.boothId);
  useSessionFitness(session.id, true);
  // The coat form's drying preview reads the racks the parts stand on.
  useRacks({ page: 1, pageSize: 200 });
  return null;
}

/** Today's sessions read ahead while the tablet is online, for a booth whose Wi-Fi may drop later. Renders nothing. */
export function SessionsWarmup({ sessions }: { sessions: SpraySession[] }) {
  const online = useOnline();
  if (!online) return null;
  return sessions.map((session) => <SessionWarmup key={session.id} session={session} />);
}
