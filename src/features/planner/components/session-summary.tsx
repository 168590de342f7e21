import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { Booth } from '../../../../shared/schemas/booth';
import { spraySessionStateLabels } from '../../../../shared/schemas/spray-session';
import { Button, buttonClasses } from '../../../components/ui/button';
import { formatShopDateTime } from '../../../lib/shop-time';
import { sessionWorkLine } from '../../../lib/session-work-words';
import { useSpraySession } from '../../../api/spray-sessions/get-spray-session';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useSessionPlan, type SessionPlan } from '../hooks/use-session-plan';
import { isMovable, sprayerWords } from '../utils/session-events';
import { sessionWhen } from '../utils/session-time';
import { SessionCautions } from './session-cautions';
import { SessionFitness } from './session-fitness';

interface SessionSummaryProps {
  /** The calendar's copy, shown while the live one loads. */
  shown: SpraySession;
  booth: Booth | undefined;
  timeZone: string;
  canWrite: boolean;
  canReadProducts: boolean;
  /** Whether to show if the booth and sprayer are fit to spray (the booth's upkeep and the sprayer's records). */
  canReadUpkeep: boolean;
  onChange: () => void;
  onCancel: () => void;
}

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-wrap gap-x-2">
      <dt className="font-semibold">{term}:</dt>
      <dd>{children}</dd>
    </div>
  );
}

function PlannedParts({ plan, count, sprayed, timeZone }: { plan: SessionPlan; count: number; sprayed: number; timeZone: string }) {
  if (count === 0) return <p className="mt-3 text-maple-700">No parts planned yet.</p>;
  return (
    <section aria-labelledby="session-parts" className="mt-4">
      <h3 id="session-parts" className="font-semibold">
        Planned parts ({count}){sprayed > 0 ? `, ${sprayed} sprayed` : ''}
      </h3>
      <ul className="mt-1 max-h-48 overflow-y-auto rounded-panel border border-maple-200 bg-white">
        {plan.rows.map((row) => (
          <li key={row.partId} className="flex flex-wrap gap-x-3 border-b border-maple-100 px-3 py-1.5 last:border-b-0">
            <Link to={`/parts/${row.partId}`} className="font-medium text-lacquer-800 underline underline-offset-4">
              {row.label}
            </Link>
            {row.jobReference && <span className="text-maple-700">Job {row.jobReference}</span>}
            <span>{row.coat}</span>
            <span className={row.sprayedAt ? 'font-medium text-verdict-go' : 'text-maple-700'}>
              {row.sprayedAt ? `✓ Sprayed ${formatShopDateTime(row.sprayedAt, timeZone)}` : 'To spray'}
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}

function windowWords(window: NonNullable<SpraySession['work']['recoatWindow']>, timeZone: string): string {
  const opens = `opens ${formatShopDateTime(window.opensAt, timeZone)}`;
  const closes = window.closesAt ? `, closes ${formatShopDateTime(window.closesAt, timeZone)}` : ', no closing time';
  return `${opens}${closes}${window.projected ? ' (worked out from the booked coat before)' : ''}`;
}

/** A session at a glance: when, where, who, its state in words, its parts and what safety asks. */
export function SessionSummary({ shown, booth, timeZone, canWrite, canReadProducts, canReadUpkeep, onChange, onCancel }: SessionSummaryProps) {
  const { data: session = shown } = useSpraySession(shown.id, shown);
  const plan = useSessionPlan(session, canReadProducts);
  const cancellable = session.state === 'planned' || session.state === 'checking';
  return (
    <div>
      <dl className="space-y-1">
        <Fact term="State">
          <span className={`rounded-full border border-maple-400 bg-white px-2 py-0.5 font-semibold ${session.state === 'cancelled' ? 'line-through' : ''}`}>
            {spraySessionStateLabels[session.state]}
          </span>
        </Fact>
        <Fact term="Booth">{session.boothName}</Fact>
        <Fact term="When">{sessionWhen(session, timeZone)}</Fact>
        <Fact term="Sprayer">{sprayerWords(session)}</Fact>
        {session.work.coats.length > 0 && <Fact term="Sprays">{sessionWorkLine(session.work)}</Fact>}
        {session.work.recoatWindow && <Fact term="Recoat window">{windowWords(session.work.recoatWindow, timeZone)}</Fact>}
        {session.notes && <Fact term="Notes">{session.notes}</Fact>}
        {session.overrideReason && <Fact term="Booked outside opening hours because">{session.overrideReason}</Fact>}
      </dl>
      <PlannedParts plan={plan} count={session.work.partCount || new Set(session.items.map((item) => item.partId)).size} sprayed={session.work.sprayedCount} timeZone={timeZone} />
      <SessionCautions plan={plan} booth={booth} />
      <SessionFitness spraySessionId={session.id} enabled={canReadUpkeep && session.state !== 'done' && session.state !== 'cancelled'} />
      <div className="mt-6 flex flex-wrap justify-end gap-3">
        {canWrite && cancellable && (
          <Button variant="danger" onClick={onCancel}>
            Cancel session
          </Button>
        )}
        {canWrite && isMovable(session) && (
          <Button variant="secondary" onClick={onChange}>
            Change booking
          </Button>
        )}
        <Link to={`/spray-sessions/${session.id}`} className={buttonClasses('primary')}>
          Open the spray session
        </Link>
      </div>
    </div>
  );
}
