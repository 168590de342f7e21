import { spawn, type ChildProcess } from 'node:child_process';

export interface RunningChild {
  base: string;
  pid: number;
  stop(): Promise<void>;
}

/** Node itself with tsx loaded (not the tsx wrapper), so the pid we sample and signal is the server. */
export function spawnTsNode(entry: string, env: NodeJS.ProcessEnv, args: string[] = []): { child: ChildProcess; stderr: () => string } {
  const child = spawn(process.execPath, ['--import', 'tsx', entry, ...args], { env: { ...env, TSX_TSCONFIG_PATH: 'tsconfig.server.json' }, stdio: ['ignore', 'ignore', 'pipe'] });
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
