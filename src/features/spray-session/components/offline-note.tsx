import { useOnline } from '../../../lib/use-online';

/** Said before anything is saved: with no connection, coats wait on the tablet and nothing else can be recorded. */
export function OfflineNote() {
  const online = useOnline();
  if (online) return null;
  return (
    <p role="status" className="mb-4 rounded-panel border-4 border-verdict-caution bg-white p-4 text-lg font-semibold text-maple-900">
      <span aria-hidden="true">⚠ </span>
      This tablet is offline. Coats you record are kept on it and sent by themselves when the connection is back; checks, mixes and denibs need the connection.
    </p>
  );
}
