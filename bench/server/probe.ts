import http from 'node:http';
import { createHistogram, monitorEventLoopDelay } from 'node:perf_hooks';

/**
 * Loaded into the measured server (`node --import`) when the bench starts it with an IPC channel:
 * watches the event loop for stalls and times each request inside the server, from the moment
 * its headers are read to the moment its answer is handed to the socket. Asked with
 * `probe:read`, it answers with the figures since the last read and starts again.
 */
export interface ProbeFigures {
  type: 'probe';
  /** The longest the event loop was held at once since the last read. */
  loopMaxMs: number;
  serverP50Ms: number;
  serverP99Ms: number;
  /** CPU time (user + system) of the whole process per answered request. */
  cpuMsPerRequest: number;
  requests: number;
}

if (process.send) {
  const loop = monitorEventLoopDelay({ resolution: 10 });
  loop.enable();
  let server = createHistogram();
  let cpu = process.cpuUsage();
  const emit = http.Server.prototype.emit as (this: http.Server, event: string, ...args: unknown[]) => boolean;
  http.Server.prototype.emit = function (this: http.Server, event: string, ...args: unknown[]) {
    if (event === 'request') {
      const started = process.hrtime.bigint();
      (args[1] as http.ServerResponse).once('finish', () => server.record(Math.max(1, Number(process.hrtime.bigint() - started))));
    }
    return emit.call(this, event, ...args);
  } as typeof http.Server.prototype.emit;
  process.on('message', (message) => {
    if (message !== 'probe:read') return;
    const used = process.cpuUsage(cpu);
    const requests = server.count;
    const figures: ProbeFigures = {
      type: 'probe',
      loopMaxMs: loop.max / 1e6,
      serverP50Ms: requests ? server.percentile(50) / 1e6 : 0,
      serverP99Ms: requests ? server.percentile(99) / 1e6 : 0,
      cpuMsPerRequest: requests ? (used.user + used.system) / 1000 / requests : 0,
      requests,
    };
    process.send!(figures);
    loop.reset();
    server = createHistogram();
    cpu = process.cpuUsage();
  });
  // The channel must not keep the server alive after SIGTERM closes it.
  process.channel?.unref();
}
