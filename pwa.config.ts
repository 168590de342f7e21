import type { VitePWAOptions } from 'vite-plugin-pwa';

export const pwaOptions: Partial<VitePWAOptions> = {
  // A new deploy waits for the person to choose "Reload", so a coat half typed in is never lost.
  registerType: 'prompt',
  injectRegister: false,
  // The dev server has no service worker: Vite's own reloading and the API proxy stay as they are.
  devOptions: { enabled: false },
  includeAssets: ['icons/apple-touch-icon.png', 'icons/boothwright-icon.svg'],
  manifest: {
    id: '/',
    name: 'Boothwright',
    short_name: 'Boothwright',
    description: 'Spray-booth planning, coat records and readiness for finishing shops',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    orientation: 'any',
    background_color: '#faf8f4',
    theme_color: '#1b5246',
    icons: [
      { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
      { src: '/icons/boothwright-icon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
    ],
  },
  workbox: {
    // The app shell: every built script, style, font and icon, so the tablet opens with no network.
    globPatterns: ['**/*.{js,css,html,svg,png,woff2}'],
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api\//],
    cleanupOutdatedCaches: true,
    // The first worker takes over the open page at once, so the session opened right after signing in
    // is already kept for offline use. A later version still waits for "Reload" (no skipWaiting).
    clientsClaim: true,
    runtimeCaching: [
      {
        // The reads the booth tablet needs to open a spray session (and its Today and session lists) with no
        // network. Sign-in, sign-out, the CSRF token, the live change stream (/api/events), reports, files
        // and every write are never cached: they are the server's answer or nothing. (The function is
        // copied into the worker as text, so the pattern is written out in it.)
        urlPattern: ({ url, sameOrigin }) =>
          sameOrigin &&
          /^\/api\/(auth\/me|auth\/session|settings|spray-sessions|booths|coats|denibs|products|finish-systems|jobs|parts|ready|readings|racks|sites|sprayers|today)(\/|$)/.test(
            url.pathname,
          ),
        method: 'GET',
        handler: 'NetworkFirst',
        options: {
          cacheName: 'boothwright-api',
          // A booth's Wi-Fi that hangs is treated like none after a few seconds: the saved copy shows.
          networkTimeoutSeconds: 4,
          expiration: { maxEntries: 400, maxAgeSeconds: 14 * 24 * 3600 },
          plugins: [
            {
              // Only JSON answers are kept (no CSV downloads, no error pages).
              cacheWillUpdate: async ({ response }) =>
                response.status === 200 && (response.headers.get('content-type') ?? '').includes('application/json')
                  ? response
                  : null,
              // A copy from the cache says when the server wrote it, so the page can show its age
              // (src/lib/saved-copy.ts reads this header; the function is copied into the worker, so the name is spelt here).
              cachedResponseWillBeUsed: async ({ cachedResponse }) => {
                if (!cachedResponse) return cachedResponse;
                const headers = new Headers(cachedResponse.headers);
                headers.set('x-boothwright-saved-at', cachedResponse.headers.get('date') ?? '');
                return new Response(await cachedResponse.blob(), {
                  status: cachedResponse.status,
                  statusText: cachedResponse.statusText,
                  headers,
                });
              },
            },
          ],
        },
      },
    ],
  },
};
