import type { BundleSizes } from './bundle-size';
import type { LoadResult } from './load/measure';
import type { TickTiming } from './notification-timing';
import type { PlannerTiming } from './planner-timing';
import type { RowCounts } from './seed/bulk-insert';

export const goals = { p99Ms: 50, ratioToBare: 0.3, plannerMs: 200, firstScreenJsKb: 200, residentMb: 200, stallMs: 50, serverMs: 1 } as const;

const mark = (ok: boolean) => (ok ? 'ok  ' : 'MISS');
const n0 = (n: number) => Math.round(n).toLocaleString('en-GB');
const n1 = (n: number) => n.toFixed(1);
const n2 = (n: number) => n.toFixed(2);
const pad = (text: string, width: number) => (text.length >= width ? text : text + ' '.repeat(width - text.length));
const lpad = (text: string, width: number) => (text.length >= width ? text : ' '.repeat(width - text.length) + text);

export function heading(text: string): void {
  console.log(`\n${text}\n${'-'.repeat(text.length)}`);
}

export function printSeed(label: string, counts: RowCounts, seconds: number, booths: number): void {
  console.log(
    `${pad(label, 26)} ${booths} booths, ${n0(counts.parts)} parts, ${n0(counts.coats)} coats, ${n0(counts.spray_sessions)} spray sessions, ${n0(counts.readings)} readings, ${n0(counts.spray_session_items)} session items  in ${n1(seconds)} s`,
  );
}

/** One line per endpoint: throughput, latency, memory, the ratio to the bare endpoint, and the goals met. */
export function printLoadTable(results: (LoadResult | { name: string; missing: string })[], bare: LoadResult | null, isRead: (name: string) => boolean): void {
  console.log(`${pad('endpoint', 30)} ${lpad('alone ms', 9)} ${lpad('req/s', 8)} ${lpad('p50 ms', 8)} ${lpad('p99 ms', 8)} ${lpad('peak RSS', 9)} ${lpad('÷ bare', 7)} ${lpad('srv ms', 7)} ${lpad('no-cache', 9)} ${lpad('cpu ms', 7)} ${lpad('srv p99', 8)} ${lpad('stall', 6)}  goals: p99 < ${goals.p99Ms} ms · ≥ ${goals.ratioToBare} of bare · RSS < ${goals.residentMb} MB · stall ≤ ${goals.stallMs} ms`);
  for (const r of results) {
    if ('missing' in r) {
      console.log(`${pad(r.name, 30)} ${r.missing}`);
      continue;
    }
    const ratio = bare ? r.requestsPerS / bare.requestsPerS : null;
    const answered = r.requests > 0;
    const checks = isRead(r.name) ? [`p99 ${mark(answered && r.p99Ms < goals.p99Ms)}`, `ratio ${mark(ratio !== null && ratio >= goals.ratioToBare)}`] : [];
    checks.push(`RSS ${mark(r.peakRssMb < goals.residentMb)}`, `stall ${mark(r.longestStallMs <= goals.stallMs)}`);
    const failed = r.failures > 0 ? `  FAILED: ${r.firstFailure}` : '';
    console.log(
      `${pad(r.name, 30)} ${lpad(String(r.aloneMs), 9)} ${lpad(n0(r.requestsPerS), 8)} ${lpad(n1(r.p50Ms), 8)} ${lpad(n1(r.p99Ms), 8)} ${lpad(`${n0(r.peakRssMb)} MB`, 9)} ${lpad(ratio === null ? '' : ratio.toFixed(3), 7)} ${lpad(n2(r.serverAloneMs), 7)} ${lpad(r.serverUncachedMs === undefined ? '' : n2(r.serverUncachedMs), 9)} ${lpad(n2(r.cpuMsPerRequest), 7)} ${lpad(n1(r.serverP99Ms), 8)} ${lpad(n0(r.longestStallMs), 6)}  ${checks.join('  ')}${failed}`,
    );
  }
}

/** The longest event-loop stall of the server over every line measured. */
export function printStalls(results: LoadResult[]): void {
  const worst = results.reduce((a, b) => (b.longestStallMs > a.longestStallMs ? b : a));
  console.log(`longest event-loop stall of the server over the whole bench: ${n0(worst.longestStallMs)} ms (during "${worst.name}")  goal ≤ ${goals.stallMs} ms ${mark(worst.longestStallMs <= goals.stallMs)}`);
}

/** How each read's latency changed from one year to ten years of records. */
export function printGrowth(oneYear: LoadResult[], tenYears: LoadResult[]): void {
  console.log(`${pad('read', 30)} ${lpad('alone 1y', 9)} ${lpad('alone 10y', 10)} ${lpad('×', 6)} ${lpad('p50 1y', 8)} ${lpad('p50 10y', 8)} ${lpad('×', 6)} ${lpad('p99 1y', 8)} ${lpad('p99 10y', 8)} ${lpad('×', 6)}`);
  for (const ten of tenYears) {
    const one = oneYear.find((r) => r.name === ten.name);
    if (!one) continue;
    const times = (a: number, b: number) => (a > 0 ? (b / a).toFixed(2) : '–');
    console.log(`${pad(ten.name, 30)} ${lpad(String(one.aloneMs), 9)} ${lpad(String(ten.aloneMs), 10)} ${lpad(times(one.aloneMs, ten.aloneMs), 6)} ${lpad(String(one.p50Ms), 8)} ${lpad(String(ten.p50Ms), 8)} ${lpad(times(one.p50Ms, ten.p50Ms), 6)} ${lpad(String(one.p99Ms), 8)} ${lpad(String(ten.p99Ms), 8)} ${lpad(times(one.p99Ms, ten.p99Ms), 6)}`);
  }
}

export function printTicks(t: TickTiming): void {
  console.log(`first tick after start (looks back a day) ${n0(t.firstMs)} ms; the ${t.ticks} after it, a minute apart: median ${n0(t.medianMs)} ms, slowest ${n0(t.maxMs)} ms; longest event-loop stall ${n0(t.longestStallMs)} ms  goal ≤ ${goals.stallMs} ms ${mark(t.longestStallMs <= goals.stallMs)}`);
}

export function printPlanner(t: PlannerTiming): void {
  console.log(
    `autoPlan, ${t.parts} parts × 3 coats (${t.jobs} jobs), 2 booths, 14 days: median ${n1(t.medianMs)} ms of ${t.runs} runs  (${t.sessionsPlanned} sessions planned, ${t.jobsOnTime}/${t.jobs} jobs by their due date)  goal < ${goals.plannerMs} ms ${mark(t.medianMs < goals.plannerMs)}`,
  );
}

export function printBundle(b: BundleSizes): void {
  const { firstScreen } = b;
  console.log(`first screen JS   ${n1(firstScreen.jsGzipKb)} KB gzipped (${firstScreen.js.map((c) => c.file).join(', ')})  goal ≤ ${goals.firstScreenJsKb} KB ${mark(firstScreen.jsGzipKb <= goals.firstScreenJsKb)}`);
  console.log(`first screen CSS  ${n1(firstScreen.cssGzipKb)} KB gzipped (${firstScreen.css.map((c) => c.file).join(', ')})`);
  console.log(`lazy chunks (${b.lazy.length}, ${n1(b.lazy.reduce((n, c) => n + c.gzipKb, 0))} KB gzipped in all), largest first:`);
  const cells = b.lazy.map((c) => `${pad(c.file, 40)} ${lpad(n1(c.gzipKb), 6)} KB`);
  for (let i = 0; i < cells.length; i += 2) console.log(`  ${cells.slice(i, i + 2).join('   ')}`);
}
