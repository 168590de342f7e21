import { Link } from 'react-router-dom';
import type { LeadBoard } from '../../../../shared/schemas/today';
import { BoardSection } from './board-section';

type Row = { key: string; who: string; fit: boolean; items: LeadBoard['upkeepDue']['booths'][number]['items']; to: string };

const rowClass = 'border-t border-maple-200 py-2 first:border-t-0';

function rowsOf(due: LeadBoard['upkeepDue']): Row[] {
  return [
    ...due.booths.map((b) => ({ key: `booth-${b.boothId}`, who: b.boothName, fit: b.fit, items: b.items, to: `/upkeep?booth=${b.boothId}` })),
    ...due.crew.map((c) => ({ key: `person-${c.userId}`, who: c.name, fit: c.fit, items: c.items, to: '/crew' })),
  ];
}

/** Booths and people not fit to spray (or soon not): the lead books filter changes and tests before a session is stopped at its checks. */
export function UpkeepDueList({ due }: { due: LeadBoard['upkeepDue'] }) {
  const rows = rowsOf(due);
  return (
    <BoardSection id="today-upkeep" title="Upkeep and crew records due" count={rows.length} quiet="Every booth and sprayer is in date.">
      <ul>
        {rows.map((row) => (
          <li key={row.key} className={rowClass}>
            <Link to={row.to} className="font-semibold text-lacquer-800 underline underline-offset-4">
              {row.who}
            </Link>
            {!row.fit && <span className="ml-2 font-semibold text-verdict-stop">not fit to spray</span>}
            <ul className="text-sm">
              {row.items.map((item) => (
                <li key={`${item.kind}-${item.message}`}>{item.message}</li>
              ))}
            </ul>
          </li>
        ))}
      </ul>
    </BoardSection>
  );
}
