import { useOnline } from '../../../lib/use-online';
import { useSavedCopyTime } from '../../../lib/saved-copy';
import { shopWhen } from '../utils/session-format';

interface OfflineNoteProps {
  /** Coats kept on this tablet that will be sent (not those the server refused). */
  waiting: number;
  timeZone: string;
}

const waitingWords = (waiting: number) =>
  waiting === 0
    ? 'nothing waiting to send'
    : waiting === 1
      ? '1 coat waiting to send'
      : `${waiting} coats waiting to send`;

/**
 * Said before anything is saved: with no connection, coats wait on the tablet and nothing else can
 * be recorded; what is on screen is the last copy the tablet saved, and its time says how old.
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
          This tablet is offline. Coats you record are kept on it and sent by themselves when the connection is back;
          checks, mixes and denibs need the connection.
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
