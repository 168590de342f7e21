import { createHistogram } from 'node:perf_hooks';
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
  /** The same with the response cache off (RESPONSE_CACHE_MB=0): every answer worked out afresh. */
  serverUncachedMs?: number;
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
  /** From the moment every connection had its first answer: the load proper, without connecting. */
  timed: { requestsPerS: number; p50Ms: number; p99Ms: number };
}

/**
 * Records each answer's latency only once every connection is open and has had its first answer,
 * so opening the connections (and a first request queued behind 49 others) is not timed.
 */
function timeOpenConnections(instance: autocannon.Instance, connections: number) {
  const opened = new Set<unknown>();
  const latencies = createHistogram();
  let startedAt = 0;
  instance.on('response', (client: unknown, _status: number, _bytes: number, responseTimeMs: number) => {
    if (startedAt) return void latencies.record(Math.max(1, Math.round(responseTimeMs * 1000)));
    opened.add(client);
    if (opened.size >= connections) startedAt = performance.now();
  });
  return () => {
    const seconds = startedAt ? (performance.now() - startedAt) / 1000 : 0;
    const count = startedAt ? latencies.count : 0;
    const ms = (p: number) => (count ? latencies.percentile(p) / 1000 : 0);
    return { requestsPerS: seconds > 0 ? count / seconds : 0, p50Ms: ms(50), p99Ms: ms(99) };
  };
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
    let timed: () => Run['timed'] = () => ({ requestsPerS: 0, p50Ms: 0, p99Ms: 0 });
    const instance = autocannon(options, (error, result) => (error ? reject(error) : resolve({ result, firstError, timed: timed() })));
    timed = timeOpenConnections(instance, connections);
    instance.on('reqError', (error: Error) => {
      firstError ??= error.message;
    });
  });
}

/** The server's median time for the request sent one at a time, after a short warm-up (bench/server/probe.mjs). */
export async function serverTimeAlone(server: RunningChild, target: Target, seconds: number): Promise<number> {
  await run(server.base, target, 1, 1);
  await server.probe();
  await run(server.base, target, 1, seconds);
  return (await server.probe()).serverP50Ms;
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
  const { result, firstError, timed } = await run(base, target, settings.connections, settings.durationS);
  const peakRssMb = memory.peakMb();
  await waitUntilIdle(pid);
  const loaded = await server.probe();
  // No answer at all within the time is a failure too, not a latency of 0. Errors include timeouts.
  const failures = result.non2xx + result.errors + (result.requests.total === 0 ? 1 : 0);
  return {
    name: target.name,
    requestsPerS: timed.requestsPerS,
    p50Ms: timed.p50Ms,
    p99Ms: timed.p99Ms,
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
