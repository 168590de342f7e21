import path from 'node:path';
import { readProbe, spawnBuiltScript, stopChild, waitUntilUp, type RunningChild } from './child-process';

/** Starts bench/server/bare-app.ts as its own process, built and run as the app is, and measured like it. */
export async function startBareServer(port: number, dir: string): Promise<RunningChild> {
  const { child, stderr } = await spawnBuiltScript(path.join('bench', 'server', 'bare-app.ts'), { ...process.env }, [String(port), path.join(dir, 'bare.sqlite')]);
  const base = `http://127.0.0.1:${port}`;
  await waitUntilUp(`${base}/health`, child, stderr);
  return { base, pid: child.pid!, probe: () => readProbe(child), stop: () => stopChild(child) };
}
