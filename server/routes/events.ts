import { answered, defineRoute, type ApiRoute } from '../registry/route';

/** Server-sent events: changes to coats, spray sessions, parts and readings, for the live views. */
export const eventRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/events',
    summary: 'Server-sent change events (coats, spray sessions, parts, readings) of the sites the user sees; open streams are capped per user and per server (429)',
    access: 'signed-in',
    sites: 'site',
    response: { status: 200, contentType: 'text/event-stream', description: 'An endless stream of `change` events' },
    handler: (_input, { services, user, req, res }) => {
      // Before any byte is written, so a refusal is still a plain 429 answer.
      const release = services.changes.claimStream(user!.id);
      res.writeHead(200, { 'Content-Type': 'text/event-stream', 'Cache-Control': 'no-cache, no-transform', Connection: 'keep-alive', 'X-Accel-Buffering': 'no' });
      res.write('retry: 3000\n\n');
      const unsubscribe = services.changes.subscribe((event) => res.write(`event: change\ndata: ${JSON.stringify(event)}\n\n`));
      // A comment line now and then keeps proxies from closing an idle stream.
      const heartbeat = setInterval(() => res.write(': keep-alive\n\n'), 20_000);
      req.on('close', () => {
        clearInterval(heartbeat);
        unsubscribe();
      });
      res.on('close', release);
      return answered;
    },
  }),
];
