import { Link } from 'react-router-dom';
import type { LeadBoard } from '../../../../shared/schemas/today';
import { formatShopClock, formatShopDateTime } from '../../../lib/shop-time';
import { partsWords } from '../../../../shared/words';
import { BoardSection } from './board-section';

const parts = partsWords;
const linkClass = 'font-semibold text-lacquer-800 underline underline-offset-4';
const rowClass = 'border-t border-maple-200 py-2 first:border-t-0';

export function RecoatClosing({ items, timeZone, today }: { items: LeadBoard['recoatClosing']; timeZone: string; today: string }) {
  return (
    <BoardSection id="today-recoat" title="Recoat windows closing today" count={items.length} quiet="No recoat window closes today.">
      <ul>
        {items.map((item) => (
          <li key={`${item.jobId}-${item.closesAt}`} className={rowClass}>
            <Link to={`/jobs/${item.jobId}`} className={linkClass}>
              {item.jobReference}
            </Link>{' '}
            · {item.customer}: {parts(item.partCount)}, {item.nextStep.toLowerCase()} by <strong className="tabular-nums">{formatShopClock(new Date(item.closesAt), timeZone)}</strong>
            <p className="text-sm">
              {item.bookedSessionId && item.bookedStart ? (
                <Link to={`/spray-sessions/${item.bookedSessionId}`} className="text-lacquer-800 underline underline-offset-4">
                  Booked for {formatShopClock(new Date(item.bookedStart), timeZone)}: open the spray session
                </Link>
              ) : (
                <span className="font-semibold text-verdict-stop">
                  Not booked in time:{' '}
                  <Link to={`/planner?day=${today}`} className="underline underline-offset-4">
                    book it in the planner
                  </Link>
                  , or denib later.
                </span>
              )}
            </p>
          </li>
        ))}
      </ul>
    </BoardSection>
  );
}

export function DenibWaiting({ items }: { items: LeadBoard['denibWaiting'] }) {
  return (
    <BoardSection id="today-denib" title="Waiting on a denib" count={items.length} quiet="No parts are waiting to be denibbed.">
      <ul>
        {items.map((item) => (
          <li key={item.jobId} className={rowClass}>
            <Link to={`/jobs/${item.jobId}`} className={linkClass}>
              {item.jobReference}
            </Link>{' '}
            · {item.customer}: {parts(item.partCount)} to denib with {item.grit}
            {item.missedWindowCount > 0 && <span className="font-semibold text-verdict-caution"> ({item.missedWindowCount} missed their recoat window)</span>}
          </li>
        ))}
      </ul>
    </BoardSection>
  );
}

export function JobsAtRisk({ items }: { items: LeadBoard['jobsAtRisk'] }) {
  return (
    <BoardSection id="today-risk" title="Jobs at risk of missing their due date" count={items.length} quiet="Every job can still be ready by its due date.">
      <ul>
        {items.map((item) => (
          <li key={item.jobId} className={rowClass}>
            <Link to={`/jobs/${item.jobId}`} className={linkClass}>
              {item.jobReference}
            </Link>{' '}
            · {item.customer}, due {item.dueDate}
            <p className={`text-sm ${item.reason === 'overdue' ? 'font-semibold text-verdict-stop' : 'text-verdict-caution'}`}>{item.words}.</p>
          </li>
        ))}
      </ul>
    </BoardSection>
  );
}

export function StaleSensors({ items, timeZone }: { items: LeadBoard['staleSensors']; timeZone: string }) {
  return (
    <BoardSection id="today-sensors" title="Booth sensors gone quiet" count={items.length} quiet="Every booth sensor is reporting.">
      <ul>
        {items.map((item) => (
          <li key={item.boothId} className={rowClass}>
            <Link to="/booths" className={linkClass}>
              {item.boothName}
            </Link>
            : {item.lastReadingAt ? `last reading ${formatShopDateTime(item.lastReadingAt, timeZone)}` : 'no reading yet from its sensor'}. Check the sensor, or type the conditions in the session.
          </li>
        ))}
      </ul>
    </BoardSection>
  );
}
