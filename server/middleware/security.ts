import helmet from 'helmet';

/** Only our own origin: the built client, its self-hosted fonts and inline styles the calendar and charts set. */
export function securityHeaders(behindHttpsProxy: boolean) {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: true,
      directives: {
        'default-src': ["'self'"],
        'script-src': ["'self'"],
        'style-src': ["'self'", "'unsafe-inline'"],
        'font-src': ["'self'", 'data:'],
        'img-src': ["'self'", 'data:', 'blob:'],
        'connect-src': ["'self'"],
        'media-src': ["'self'", 'blob:'],
        'worker-src': ["'self'", 'blob:'],
        // Plain HTTP on the workshop network must keep working; upgrade only behind HTTPS.
        'upgrade-insecure-requests': behindHttpsProxy ? [] : null,
      },
    },
  });
}
