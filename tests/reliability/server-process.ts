// The web server as it is deployed (server/main.ts: API and embedded run worker) in a process of
// its own, so that a test can tell whether it lived through a fault (same process, still
// answering) and read what it logged.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { freePort } from './throwaway-cluster';

const repoRoot = path.resolve(__dirname, '../..');
const START_TIMEOUT_MS = 30_000;

export type ServerProcess = {
  url: string;
  pid: number;
  /** Still running (not exited or killed since it started). */
  alive(): boolean;
  /** What it wrote to stdout and stderr (pino JSON lines; warnings and errors in the test environment). */
  output(): string;
  stop(): Promise<void>;
};

/** Starts the server on a free port with `env` (DATABASE_URL, SMTP_URL, …) and waits until /health answers 200. */
export async function startServerProcess(env: Record<string, string>): Promise<ServerProcess> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
    cwd: repoRoot,
    env: { ...process.env, NODE_ENV: 'test', PORT: String(port), APP_URL: url, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const chunks: Buffer[] = [];
  child.stdout.on('data', (chunk: Buffer) => chunks.push(chunk));
  child.stderr.on('data', (chunk: Buffer) => chunks.push(chunk));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const alive = (): boolean => child.exitCode === null && child.signalCode === null;
  const server: ServerProcess = {
    url,
    pid: child.pid!,
    alive,
    output: () => Buffer.concat(chunks).toString(),
    async stop() {
      if (alive()) child.kill('SIGTERM');
      await exited;
    },
  };

  const until = Date.now() + START_TIMEOUT_MS;
  while (alive() && Date.now() < until) {
    const status = await fetch(`${url}/api/v1/health`).then((res) => res.status, () => 0);
    if (status === 200) return server;
    await new Promise((r) => setTimeout(r, 100));
  }
  await server.stop();
  throw new Error(`the server did not start: ${server.output().slice(-2_000) || 'no output'}`);
}
