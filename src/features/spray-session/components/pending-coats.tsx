import { Button } from '../../../components/ui/button';
import type { PendingCoat } from '../hooks/use-pending-coats';
import { shopWhen } from '../utils/session-format';

interface PendingCoatsProps {
  pending: PendingCoat[];
  timeZone: string;
  onResend: () => void;
  onDiscard: (key: string) => void;
}

/** Coats kept on this tablet until the server has them; they are not part of the record until then. */
export function PendingCoats({ pending, timeZone, onResend, onDiscard }: PendingCoatsProps) {
  if (pending.length === 0) return null;
  return (
    <section aria-labelledby="pending-heading" className="rounded-panel border-4 border-dashed border-verdict-caution bg-white p-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h3 id="pending-heading" className="text-lg font-bold text-verdict-caution">
          Kept on this tablet ({pending.length})
        </h3>
        <Button variant="secondary" onClick={onResend}>
          Send now
        </Button>
      </div>
      <p className="text-maple-800">Sent again by itself when the connection is back, and every 15 seconds. Do not clear this browser’s data until they are sent.</p>
      <ul className="mt-2 space-y-2">
        {pending.map((coat) => (
          <li key={coat.body.idempotencyKey} className="rounded-panel bg-maple-50 p-3">
            <p>
              <span className="mr-2 rounded-panel bg-verdict-caution px-2 py-0.5 font-bold text-white">Pending — not yet on the server</span>
              {coat.label}, sprayed {shopWhen(coat.body.sprayedAt, timeZone)}
            </p>
            {coat.problem && (
              <div className="mt-2 flex flex-wrap items-center gap-3">
                <p className="font-medium text-verdict-stop">The server refused it: {coat.problem}</p>
                <Button variant="danger" onClick={() => onDiscard(coat.body.idempotencyKey)}>
                  Discard it
                </Button>
              </div>
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}
