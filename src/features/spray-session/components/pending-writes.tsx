import { Button } from '../../../components/ui/button';
import type { PendingWrite } from '../hooks/use-pending-writes';
import { heldBehindRefusal } from '../utils/send-writes';
import { shopWhen } from '../utils/session-format';

interface PendingWritesProps {
  pending: PendingWrite[];
  timeZone: string;
  onResend: () => void;
  onDiscard: (key: string) => void;
}

function madeAt(write: PendingWrite): string {
  switch (write.kind) {
    case 'coat':
      return write.body.sprayedAt;
    case 'mix':
      return write.body.mixedAt;
    case 'denib':
      return write.body.abradedAt;
    case 'session':
      return write.body.changedAt;
  }
}

/** What was recorded on this tablet and is not on the server yet, in the order it will be sent. */
export function PendingWrites({ pending, timeZone, onResend, onDiscard }: PendingWritesProps) {
  if (pending.length === 0) return null;
  const held = heldBehindRefusal(pending);
  return (
    <section
      aria-labelledby="pending-heading"
      className="rounded-panel border-4 border-dashed border-verdict-caution bg-white p-4"
    >
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h3 id="pending-heading" className="text-lg font-bold text-verdict-caution">
          Kept on this tablet ({pending.length})
        </h3>
        <Button variant="secondary" onClick={onResend}>
          Send now
        </Button>
      </div>
      <p className="text-maple-800">
        Sent by themselves, in this order, when the connection is back and every 15 seconds. Do not clear this browser’s
        data until they are sent.
      </p>
      <ol className="mt-2 space-y-2">
        {pending.map((write) => (
          <li key={write.body.idempotencyKey} className="rounded-panel bg-maple-50 p-3">
            <p>
              <span className="mr-2 rounded-panel bg-verdict-caution px-2 py-0.5 font-bold text-white">
                Pending — not yet on the server
              </span>
              {write.label}, {shopWhen(madeAt(write), timeZone)}
            </p>
            {held.has(write.body.idempotencyKey) && (
              <p className="mt-1 font-medium text-maple-800">Waits until the refused record above is dealt with.</p>
            )}
            {write.problem && (
              <div className="mt-2 flex flex-wrap items-center gap-3">
                <p className="font-medium text-verdict-stop">The server refused it: {write.problem}</p>
                <Button variant="danger" onClick={() => onDiscard(write.body.idempotencyKey)}>
                  Discard it
                </Button>
              </div>
            )}
          </li>
        ))}
      </ol>
    </section>
  );
}
