import http from 'node:http';
import { createHistogram, monitorEventLoopDelay } from 'node:perf_hooks';

/**
 * Loaded into the measured server (`node --import`) when the bench starts it with an IPC channel:
 * watches the event loop for stalls and times each request inside the server, from the moment
 * its headers are read to the moment its answer is handed to the socket. Asked with
 * `probe:read`, it answers with the figures since the last read (`ProbeFigures` in
 * child-process.ts) and starts again. Plain JavaScript, so the built server runs with no
 * TypeScript loader in it, as in production.
 */
if (process.send) {
  const loop = monitorEventLoopDelay({ resolution: 10 });
  loop.enable();
  let server = createHistogram();
  let cpu = process.cpuUsage();
  const emit = http.Server.prototype.emit;
  http.Server.prototype.emit = function (event, ...args) {
    if (event === 'request') {
      const started = process.hrtime.bigint();
      args[1].once('finish', () => server.record(Math.max(1, Number(process.hrtime.bigint() - started))));
    }
    return emit.call(this, event, ...args);
  };
  process.on('message', (message) => {
    if (message !== 'probe:read') return;
    const used = process.cpuUsage(cpu);
    const requests = server.count;
    const figures = {
      type: 'probe',
      loopMaxMs: loop.max / 1e6,
      serverP50Ms: requests ? server.percentile(50) / 1e6 : 0,
      serverP99Ms: requests ? server.percentile(99) / 1e6 : 0,
      cpuMsPerRequest: requests ? (used.user + used.system) / 1000 / requests : 0,
      requests,
    };
    process.send(figures);
    loop.reset();
    server = createHistogram();
    cpu = process.cpuUsage();
  });
  // The channel must not keep the server alive after SIGTERM closes it.
  process.channel?.unref();
}
