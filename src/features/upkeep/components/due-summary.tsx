import type { UpkeepDue, UpkeepDueItem } from '../../../../shared/schemas/upkeep';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

const toneOf = (item: UpkeepDueItem): StatusTone => (['lapsed', 'over-limit', 'failed'].includes(item.status) || (item.status === 'none' && item.kind !== 'training') ? 'stop' : item.status === 'none' ? 'quiet' : 'caution');

function Row({ name, fit, items }: { name: string; fit: boolean; items: UpkeepDueItem[] }) {
  return (
    <li className="py-2">
      <div className="flex flex-wrap items-center gap-2">
        <span className="font-semibold">{name}</span>
        <StatusBadge tone={fit ? 'caution' : 'stop'}>{fit ? 'Due soon' : 'Not fit to spray'}</StatusBadge>
      </div>
      <ul className="mt-1 space-y-0.5 pl-1">
        {items.map((item) => (
          <li key={`${item.kind}-${item.message}`} className={toneOf(item) === 'stop' ? 'text-verdict-stop' : 'text-maple-900'}>
            <span aria-hidden="true">{toneOf(item) === 'stop' ? '✕ ' : '! '}</span>
            {item.message}
          </li>
        ))}
      </ul>
    </li>
  );
}

/** Fitness to spray across the site: each booth and person not fit now, or due soon. */
export function DueSummary({ due }: { due: UpkeepDue }) {
  const nothing = due.booths.length === 0 && due.crew.length === 0;
  return (
    <section aria-labelledby="due-summary" className="rounded-panel border border-maple-300 bg-white p-4">
      <h2 id="due-summary" className="text-xl font-semibold">
        Fitness to spray
      </h2>
      {nothing ? (
        <p className="mt-1 text-maple-800">Every booth and {due.wholeCrew ? 'everyone' : 'your own record'} is in order for the next weeks.</p>
      ) : (
        <div className="mt-2 grid gap-4 lg:grid-cols-2">
          <div>
            <h3 className="font-semibold text-maple-800">Booths</h3>
            {due.booths.length === 0 ? <p className="text-maple-800">All in order.</p> : <ul className="divide-y divide-maple-200">{due.booths.map((b) => <Row key={b.boothId} name={b.boothName} fit={b.fit} items={b.items} />)}</ul>}
          </div>
          <div>
            <h3 className="font-semibold text-maple-800">{due.wholeCrew ? 'Crew (status only)' : 'Your records'}</h3>
            {due.crew.length === 0 ? <p className="text-maple-800">All in order.</p> : <ul className="divide-y divide-maple-200">{due.crew.map((c) => <Row key={c.userId} name={c.name} fit={c.fit} items={c.items} />)}</ul>}
          </div>
        </div>
      )}
    </section>
  );
}
