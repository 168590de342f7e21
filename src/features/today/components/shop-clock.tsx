import { useEffect, useState } from 'react';
import { formatShopClock, formatShopDate, shopZoneName } from '../../../lib/shop-time';

/** The date and time in the shop's timezone, refreshed every half minute. */
export function ShopClock({ timeZone }: { timeZone: string }) {
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    const timer = window.setInterval(() => setNow(new Date()), 30_000);
    return () => window.clearInterval(timer);
  }, []);

  return (
    <p className="text-lg text-maple-800">
      <time dateTime={now.toISOString()}>
        {formatShopDate(now, timeZone)}, <span className="font-semibold tabular-nums">{formatShopClock(now, timeZone)}</span>
      </time>{' '}
      <span className="text-maple-700">
        ({shopZoneName(now, timeZone)}, {timeZone})
      </span>
    </p>
  );
}
