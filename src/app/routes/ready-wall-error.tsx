import { useEffect, useState } from 'react';
import { useRouteError } from 'react-router-dom';

const checkEveryMs = 15_000;

/**
 * Nobody stands at a wall screen to press "Reload": when the page itself fails (a new version
 * after a restart), it reloads on its own, but only once the server answers, because reloading
 * while it is down would leave the browser's own error page, which never retries.
 */
export function ReadyWallError() {
  const error = useRouteError();
  const [tries, setTries] = useState(0);
  useEffect(() => {
    if (import.meta.env.DEV) console.error(error);
    const timer = window.setTimeout(async () => {
      const healthy = await fetch('/api/health', { cache: 'no-store' }).then((r) => r.ok, () => false);
      if (healthy) window.location.reload();
      else setTries((n) => n + 1);
    }, checkEveryMs);
    return () => window.clearTimeout(timer);
  }, [error, tries]);
  return (
    <div role="alert" className="grid min-h-dvh place-items-center bg-maple-50 p-8 text-center text-maple-900">
      <div>
        <h1 className="text-5xl font-bold">Ready board paused</h1>
        <p className="mt-4 text-3xl">The screen hit a problem. It reloads itself as soon as Boothwright answers; checking every {checkEveryMs / 1000} s.</p>
      </div>
    </div>
  );
}
