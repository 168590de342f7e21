import { formatShopClock } from '../../../lib/shop-time';
import { useLiveStatus } from '../../../lib/live-status';
import { livePollMs } from '../../../lib/use-live-updates';

interface LiveNoteProps {
  /** The last answer could not be fetched again; what shows is from `updatedAt`. */
  failing: boolean;
  updatedAt: number;
  timeZone: string;
  className?: string;
}

/** Says whether what is on screen is live, and if not, how old it is; in words, not a coloured dot. */
export function LiveNote({ failing, updatedAt, timeZone, className = '' }: LiveNoteProps) {
  const status = useLiveStatus();
  const asOf = updatedAt ? formatShopClock(new Date(updatedAt), timeZone) : null;
  let text: string;
  if (failing) text = `Reconnecting… showing the board as it was at ${asOf ?? 'the last check'}; trying again every ${livePollMs / 1000} s.`;
  else if (status === 'live') text = `Live: changes show as they happen. Last checked ${asOf ?? 'just now'}.`;
  else if (status === 'connecting') text = 'Connecting for live changes…';
  else text = `Reconnecting… live changes paused, so the board refreshes every ${livePollMs / 1000} s. Last checked ${asOf ?? 'just now'}.`;
  const warn = failing || status === 'reconnecting';
  return (
    <p role="status" className={`${warn ? 'font-semibold text-verdict-caution' : 'text-maple-700'} ${className}`}>
      {warn && <span aria-hidden="true">⚠ </span>}
      {text}
    </p>
  );
}
