import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { useRegisterSW } from 'virtual:pwa-register/react';

const checkEveryMs = 60 * 60 * 1000;

/**
 * Registers the service worker that lets the booth tablet open with no network, and says when a
 * new version of Boothwright has been deployed. It waits for "Reload" rather than reloading by
 * itself, so a coat half typed in is never lost; coats waiting on the tablet are kept either way.
 */
/**
 * What was read before the service worker took over the page (the signed-in user, the shop's
 * settings) never passed through it; read it again once it does, so it is kept for offline use too.
 */
function useRereadWhenWorkerTakesOver() {
  const queryClient = useQueryClient();
  useEffect(() => {
    const container = navigator.serviceWorker;
    if (!container) return;
    const reread = () => void queryClient.invalidateQueries();
    container.addEventListener('controllerchange', reread);
    return () => container.removeEventListener('controllerchange', reread);
  }, [queryClient]);
}

export function NewVersionNotice() {
  useRereadWhenWorkerTakesOver();
  const {
    needRefresh: [needRefresh, setNeedRefresh],
    updateServiceWorker,
  } = useRegisterSW({
    // A tablet left open all day still hears of a deploy: ask the server once an hour.
    onRegisteredSW(_url, registration) {
      if (!registration) return;
      window.setInterval(() => {
        if (navigator.onLine) registration.update().catch(() => undefined);
      }, checkEveryMs);
    },
  });
  if (!needRefresh) return null;
  return (
    <div
      role="status"
      className="fixed inset-x-0 bottom-0 z-50 border-t-4 border-lacquer-500 bg-white p-4 shadow-lg print:hidden"
    >
      <div className="mx-auto flex max-w-4xl flex-wrap items-center justify-between gap-3">
        <p className="text-lg font-semibold text-maple-900">
          A new version of Boothwright is ready. Reload to use it; coats waiting on this tablet are kept.
        </p>
        <div className="flex gap-3">
          <button
            type="button"
            onClick={() => setNeedRefresh(false)}
            className="min-h-touch rounded-panel border border-maple-400 bg-white px-4 font-semibold hover:bg-maple-100"
          >
            Later
          </button>
          <button
            type="button"
            onClick={() => void updateServiceWorker(true)}
            className="min-h-touch rounded-panel bg-lacquer-700 px-4 font-semibold text-white hover:bg-lacquer-800"
          >
            Reload now
          </button>
        </div>
      </div>
    </div>
  );
}
