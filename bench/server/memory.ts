import fs from 'node:fs';

const kbField = (status: string, field: string) => Number(new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(status)?.[1] ?? 0);

function readStatus(pid: number): string {
  try {
    return fs.readFileSync(`/proc/${pid}/status`, 'utf8');
  } catch {
    return '';
  }
}

/**
 * Watches a process's resident memory during one measurement. The kernel's high-water mark
 * (VmHWM) is reset first where allowed (clear_refs 5), and VmRSS is polled as well, so the
 * peak belongs to this measurement and not to an earlier one.
 */
export function watchMemory(pid: number, everyMs = 50): { peakMb(): number } {
  let highWaterReset = true;
  try {
    fs.writeFileSync(`/proc/${pid}/clear_refs`, '5');
  } catch {
    // Not allowed here: the polled VmRSS alone gives the peak.
    highWaterReset = false;
  }
  let peakKb = 0;
  const poll = () => {
    peakKb = Math.max(peakKb, kbField(readStatus(pid), 'VmRSS'));
  };
  poll();
  const timer = setInterval(poll, everyMs);
  return {
    peakMb() {
      clearInterval(timer);
      poll();
      return Math.max(peakKb, highWaterReset ? kbField(readStatus(pid), 'VmHWM') : 0) / 1024;
    },
  };
}

function cpuTicks(pid: number): number {
  try {
    // Fields after the command name (which may hold spaces): utime and stime are the 12th and 13th.
    const fields = fs.readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
    return Number(fields[11]) + Number(fields[12]);
  } catch {
    return 0;
  }
}

/**
 * Waits until the process has (almost) stopped using the CPU: requests that autocannon left in
 * flight at the end of one measurement must not be served during the next one.
 */
export async function waitUntilIdle(pid: number, timeoutMs = 30_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let before = cpuTicks(pid);
  while (Date.now() < deadline) {
    await new Promise((resolve) => setTimeout(resolve, 250));
    const now = cpuTicks(pid);
    // Clock ticks are 10 ms: under 3 in a quarter second is under 12 % of a core.
    if (now - before < 3) return;
    before = now;
  }
}
