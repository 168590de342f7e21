import type { ReactNode } from 'react';
import { roleLabels } from '../../../../shared/permissions';
import type { SignedInUser } from '../../../../shared/schemas/auth';
import type { ShopSettings } from '../../../../shared/schemas/settings';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { useToday } from '../../../api/today/get-today';
import { LeadBoard } from './lead-board';
import { ShopClock } from './shop-clock';
import { SprayerBoard } from './sprayer-board';

interface TodayPageProps {
  user: SignedInUser;
  settings: ShopSettings;
  /** An admin looking at one site, and the switcher that chooses it. */
  siteId?: number;
  siteSwitcher?: ReactNode;
}

const intro: Partial<Record<SignedInUser['role'], string>> = {
  admin: 'The day across your booths: who sprays what, and what needs you.',
  lead: 'The day across your booths: who sprays what, and what needs you.',
  sprayer: 'Your sessions today, and the next thing to do in each.',
};

/** The day's working board for the signed-in person's role. */
export function TodayPage({ user, settings, siteId, siteSwitcher }: TodayPageProps) {
  const board = useToday(siteId);
  return (
    <div className="space-y-6">
      <section aria-labelledby="today-heading" className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="font-semibold uppercase tracking-wide text-lacquer-700">{settings.shopName}</p>
          <h1 id="today-heading" className="text-3xl font-bold text-lacquer-900">
            Today
          </h1>
          <ShopClock timeZone={settings.timezone} />
          <p className="mt-1 max-w-2xl text-maple-800">
            {user.name}, {roleLabels[user.role].toLowerCase()}. {intro[user.role]}
          </p>
        </div>
        {siteSwitcher}
      </section>
      {board.isPending ? (
        <LoadingState what="the day’s board" />
      ) : board.isError ? (
        <ErrorState error={board.error} what="the day’s board" onRetry={() => board.refetch()} />
      ) : board.data.view === 'lead' ? (
        <LeadBoard board={board.data} timeZone={settings.timezone} />
      ) : (
        <SprayerBoard board={board.data} timeZone={settings.timezone} />
      )}
    </div>
  );
}
