import { Link } from 'react-router-dom';
import { can, roleLabels } from '../../../../shared/permissions';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { ShopSettings } from '../../../../shared/schemas/settings';
import { readyCards, roleIntro, type ReadyCard } from './today-content';
import { ShopClock } from './shop-clock';

interface TodayPageProps {
  user: SessionUser;
  settings?: ShopSettings;
  counts: Partial<Record<NonNullable<ReadyCard['count']>, number>>;
}

function countWords(card: ReadyCard, counts: TodayPageProps['counts']): string | null {
  if (!card.count) return null;
  const n = counts[card.count];
  if (n === undefined) return null;
  return `${n} ${n === 1 ? card.count.slice(0, -1) : card.count} set up`;
}

export function TodayPage({ user, settings, counts }: TodayPageProps) {
  const cards = readyCards.filter((card) => !card.permission || can(user.role, card.permission));

  return (
    <div className="space-y-8">
      <section aria-labelledby="today-heading">
        <p className="font-semibold uppercase tracking-wide text-lacquer-700">{settings?.shopName ?? 'Your shop'}</p>
        <h1 id="today-heading" className="text-3xl font-bold text-lacquer-900">
          Today
        </h1>
        {settings ? <ShopClock timeZone={settings.timezone} /> : <p className="text-maple-700">Loading the shop’s clock…</p>}
        <p className="mt-2 max-w-2xl">
          Signed in as <strong>{user.name}</strong>, {roleLabels[user.role].toLowerCase()}. {roleIntro[user.role]}
        </p>
      </section>

      <section aria-labelledby="ready-heading">
        <h2 id="ready-heading" className="mb-3 text-xl font-semibold">
          Ready to use
        </h2>
        <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3">
          {cards.map((card) => (
            <li key={card.to}>
              <Link
                to={card.to}
                className="block h-full min-h-touch rounded-panel border border-maple-300 bg-white p-4 shadow-sm hover:border-lacquer-500 hover:bg-lacquer-50"
              >
                <span className="block text-lg font-semibold text-lacquer-800 underline-offset-4">{card.title}</span>
                <span className="mt-1 block text-maple-800">{card.text}</span>
                {countWords(card, counts) && <span className="mt-2 block text-sm font-medium text-maple-700">{countWords(card, counts)}</span>}
              </Link>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
