import autocannon from 'autocannon';
import type { RunningChild } from '../server/child-process';
import { waitUntilIdle, watchMemory } from '../server/memory';

export interface LoadSettings {
  connections: number;
  durationS: number;
  warmUpS: number;
  /** How long to send requests one at a time before the full load. */
  aloneS: number;
}

export interface Target {
  name: string;
  method: 'GET' | 'POST';
  path: string;
  headers: Record<string, string>;
  /** Makes each request's body (a fresh idempotency key, say); GETs leave it out. */
  body?: () => string;
}

export interface LoadResult {
  name: string;
  requestsPerS: number;
  p50Ms: number;
  p99Ms: number;
  /** Median latency with one connection: what one request costs the server, without queueing. */
  aloneMs: number;
  peakRssMb: number;
  requests: number;
  /** Answers other than 2xx, plus timeouts and socket errors: any of these spoils the figures. */
  failures: number;
  firstFailure: string | null;
  /** Inside the server, one request at a time: median time from headers read to answer sent. */
  serverAloneMs: number;
  /** The server process's CPU time per request, one request at a time. */
  cpuMsPerRequest: number;
  /** Inside the server, under the full load: 99th percentile. */
  serverP99Ms: number;
  /** The longest the server's event loop was held at once, from warm-up to the end of this line. */
  longestStallMs: number;
}

interface Run {
  result: autocannon.Result;
  firstError: string | null;
}

function run(base: string, target: Target, connections: number, durationS: number): Promise<Run> {
  const body = target.body;
  const options: autocannon.Options = {
    url: base,
    connections,
    duration: durationS,
    timeout: 30,
    requests: [
      {
        method: target.method,
        path: target.path,
        headers: target.headers,
        ...(body ? { setupRequest: (request: autocannon.Request) => ({ ...request, body: body() }) } : {}),
      },
    ],
  };
  return new Promise((resolve, reject) => {
    let firstError: string | null = null;
    const instance = autocannon(options, (error, result) => (error ? reject(error) : resolve({ result, firstError })));
    instance.on('reqError', (error: Error) => {
      firstError ??= error.message;
    });
  });
}

/** Says why a measurement failed: no answer, socket errors, or what a non-2xx answer says. */
async function describeFailure(base: string, target: Target, result: autocannon.Result, firstError: string | null, durationS: number): Promise<string | null> {
  if (result.requests.total === 0) return `no answer within ${durationS} s`;
  if (result.errors > 0) return `${result.errors} socket errors (${result.timeouts} timeouts), first: ${firstError}`;
  if (result.non2xx === 0) return null;
  const res = await fetch(`${base}${target.path}`, { method: target.method, headers: target.headers, body: target.body?.() });
  return `${result.non2xx} answers not 2xx, e.g. ${res.status} ${(await res.text()).slice(0, 160)}`;
}

// Enough to compile the hot paths and fill the caches without leaving a backlog behind.
const warmUpConnections = 4;

/** Warms the endpoint up, then loads it for the set time while watching the server's memory. */
export async function measure(server: RunningChild, target: Target, settings: LoadSettings): Promise<LoadResult> {
  const { base, pid } = server;
  await server.probe();
  if (settings.warmUpS > 0) await run(base, target, warmUpConnections, settings.warmUpS);
  await waitUntilIdle(pid);
  const warm = await server.probe();
  const alone = (await run(base, target, 1, settings.aloneS)).result;
  const inside = await server.probe();
  await waitUntilIdle(pid);
  const memory = watchMemory(pid);
  const { result, firstError } = await run(base, target, settings.connections, settings.durationS);
  const peakRssMb = memory.peakMb();
  await waitUntilIdle(pid);
  const loaded = await server.probe();
  // No answer at all within the time is a failure too, not a latency of 0. Errors include timeouts.
  const failures = result.non2xx + result.errors + (result.requests.total === 0 ? 1 : 0);
  return {
    name: target.name,
    requestsPerS: result.requests.average,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    aloneMs: alone.latency.p50,
    peakRssMb,
    requests: result.requests.total,
    failures,
    firstFailure: await describeFailure(base, target, result, firstError, settings.durationS),
    serverAloneMs: inside.serverP50Ms,
    cpuMsPerRequest: inside.cpuMsPerRequest,
    serverP99Ms: loaded.serverP99Ms,
    longestStallMs: Math.max(warm.loopMaxMs, inside.loopMaxMs, loaded.loopMaxMs),
  };
}
