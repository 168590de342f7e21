import { Link } from 'react-router-dom';
import { spraySessionStateLabels, type SpraySession, type SpraySessionState } from '../../../../shared/schemas/spray-session';
import { coatHeadline, coatMaterial, partsWords } from '../../../lib/session-work-words';
import { sessionSpan } from '../utils/session-format';

const stateStyles: Record<SpraySessionState, string> = {
  planned: 'border-maple-500 bg-white text-maple-900',
  checking: 'border-verdict-caution bg-white text-verdict-caution',
  spraying: 'border-lacquer-700 bg-lacquer-700 text-white',
  clearing: 'border-verdict-caution bg-verdict-caution text-white',
  done: 'border-verdict-go bg-white text-verdict-go',
  cancelled: 'border-verdict-stop bg-white text-verdict-stop line-through',
};

export function SessionStateBadge({ state }: { state: SpraySessionState }) {
  return <span className={`inline-block rounded-panel border-2 px-3 py-1 font-bold ${stateStyles[state]}`}>{spraySessionStateLabels[state]}</span>;
}

function Fact({ term, children }: { term: string; children: React.ReactNode }) {
  return (
    <div>
      <dt className="text-sm font-medium text-maple-700">{term}</dt>
      <dd className="text-lg font-semibold text-maple-900">{children}</dd>
    </div>
  );
}

export function SessionHeader({ session, timeZone, partCount }: { session: SpraySession; timeZone: string; partCount: number }) {
  return (
    <header className="mb-6">
      <p className="mb-1">
        <Link to="/spray-sessions" className="inline-flex min-h-touch items-center font-semibold text-lacquer-800 underline underline-offset-4">
          ← My spray sessions
        </Link>
      </p>
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-bold text-lacquer-900 sm:text-3xl">{session.boothName}</h1>
        <SessionStateBadge state={session.state} />
      </div>
      <dl className="mt-3 grid gap-3 sm:grid-cols-3">
        <Fact term="When (shop time)">{sessionSpan(session, timeZone)}</Fact>
        <Fact term="Sprayer">{session.sprayerName ?? 'Not assigned'}</Fact>
        <Fact term="Planned parts">{partCount === 0 ? 'None planned' : partsWords({ partCount, sprayedCount: session.work.sprayedCount })}</Fact>
      </dl>
      {session.work.coats.length > 0 && (
        <ul aria-label="What this session sprays" className="mt-2 space-y-0.5 text-lg">
          {session.work.coats.map((coat) => (
            <li key={`${coat.jobId}-${coat.stepPosition}`}>
              <span className="font-semibold">{coatHeadline(coat)}</span>: {coatMaterial(coat)} ({partsWords(coat)})
            </li>
          ))}
        </ul>
      )}
      {session.notes && <p className="mt-3 rounded-panel border border-maple-300 bg-white p-3">{session.notes}</p>}
    </header>
  );
}
