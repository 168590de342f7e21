import { useOnline } from '../../../lib/use-online';
import { useSavedCopyTime } from '../../../lib/saved-copy';
import { shopWhen } from '../utils/session-format';
import type { PendingKind, PendingWrite } from '../utils/write-queue';

interface OfflineNoteProps {
  /** Writes kept on this tablet that will be sent (not those the server refused). */
  waiting: PendingWrite[];
  timeZone: string;
}

const kindWords: Record<PendingKind, [string, string]> = {
  session: ['session step', 'session steps'],
  mix: ['mix', 'mixes'],
  coat: ['coat', 'coats'],
  denib: ['denib', 'denibs'],
};

/** "2 coats waiting to send", "1 session step, 1 mix and 2 coats waiting to send". */
export function waitingWords(waiting: PendingWrite[]): string {
  const counts = (Object.keys(kindWords) as PendingKind[])
    .map((kind) => [kind, waiting.filter((write) => write.kind === kind).length] as const)
    .filter(([, count]) => count > 0)
    .map(([kind, count]) => `${count} ${kindWords[kind][count === 1 ? 0 : 1]}`);
  if (counts.length === 0) return 'nothing waiting to send';
  const listed = counts.length === 1 ? counts[0] : `${counts.slice(0, -1).join(', ')} and ${counts[counts.length - 1]}`;
  return `${listed} waiting to send`;
}

/**
 * Said before anything is saved: with no connection, what the sprayer records waits on the tablet;
 * what is on screen is the last copy the tablet saved, and its time says how old.
 */
export function OfflineNote({ waiting, timeZone }: OfflineNoteProps) {
  const online = useOnline();
  const savedAt = useSavedCopyTime();
  if (online && savedAt === null) return null;
  const copy = savedAt === null ? null : shopWhen(new Date(savedAt).toISOString(), timeZone);
  return (
    <div
      role="status"
      className="mb-4 rounded-panel border-4 border-verdict-caution bg-white p-4 text-lg text-maple-900"
    >
      {online ? (
        <p className="font-bold">The server did not answer in time</p>
      ) : (
        <p className="text-xl font-bold">
          <span aria-hidden="true">⚠ </span>Offline — {waitingWords(waiting)}
        </p>
      )}
      {!online && (
        <p className="font-semibold">
          This tablet is offline. The checks, mixes, start and stop, coats and denibs you record are kept on it and
          sent by themselves, in order, when the connection is back.
        </p>
      )}
      {copy && (
        <p className="mt-1">
          Showing the copy saved on this tablet at {copy}: anything recorded elsewhere since then is not shown.
        </p>
      )}
    </div>
  );
}
