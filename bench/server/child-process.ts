import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { ProbeFigures } from './probe';

export interface RunningChild {
  base: string;
  pid: number;
  /** The server's own figures since the last read (bench/server/probe.ts). */
  probe(): Promise<ProbeFigures>;
  stop(): Promise<void>;
}

/** Asks the probe inside the child for its figures. */
export function readProbe(child: ChildProcess): Promise<ProbeFigures> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('the server did not answer the probe')), 120_000);
    const answer = (message: unknown) => {
      if ((message as ProbeFigures)?.type !== 'probe') return;
      clearTimeout(timer);
      child.off('message', answer);
      resolve(message as ProbeFigures);
    };
    child.on('message', answer);
    child.send('probe:read');
  });
}

/** Node itself with tsx and the probe loaded (not the tsx wrapper), so the pid we sample and signal is the server. */
export function spawnTsNode(entry: string, env: NodeJS.ProcessEnv, args: string[] = []): { child: ChildProcess; stderr: () => string } {
  const probe = path.resolve('bench', 'server', 'probe.ts');
  const child = spawn(process.execPath, ['--import', 'tsx', '--import', probe, entry, ...args], { env: { ...env, TSX_TSCONFIG_PATH: 'tsconfig.server.json' }, stdio: ['ignore', 'ignore', 'pipe', 'ipc'] });
  let stderr = '';
  child.stderr?.on('data', (chunk: Buffer) => {
    stderr = (stderr + chunk.toString()).slice(-4000);
  });
  return { child, stderr: () => stderr };
}

/** Waits until `url` answers 200, or fails with what the child printed. */
export async function waitUntilUp(url: string, child: ChildProcess, stderr: () => string, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`${url}: the process exited (${child.exitCode}) before answering:\n${stderr()}`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // Not listening yet.
    }
    if (Date.now() > deadline) throw new Error(`${url} did not answer within ${timeoutMs / 1000} s:\n${stderr()}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/** SIGTERM, then SIGKILL if the process has not gone after a few seconds. */
export function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const kill = setTimeout(() => child.kill('SIGKILL'), 8000);
    child.once('exit', () => {
      clearTimeout(kill);
      resolve();
    });
    child.kill('SIGTERM');
  });
}
