// A PostgreSQL cluster of a test's own, in a temporary directory on a free port of 127.0.0.1, that
// the test may stop and start at will without touching the cluster other tests share. pg_ctl runs
// asynchronously, so the server under test keeps answering while the database goes and comes back.
import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { ensureBinaries, initdbArgs, LOCAL_PG_USER, ownForPostgres, pgCommand, pgCtlStartArgs, type ClusterPaths } from '../../server/scripts/postgres';

const execFileAsync = promisify(execFile);

export type ThrowawayCluster = {
  url(database: string): string;
  /** pg_ctl stop -m fast: sessions are ended at once (as in a restart for an upgrade or a failover). */
  stop(): Promise<void>;
  start(): Promise<void>;
  /** Stops the cluster if it runs and removes its directory. */
  destroy(): Promise<void>;
};

/** Clusters not yet destroyed, for an afterAll that must clean up whatever a failed test left. */
const live = new Set<ThrowawayCluster>();

export async function destroyThrowawayClusters(): Promise<void> {
  await Promise.all([...live].map((cluster) => cluster.destroy()));
}

/** A port nobody listens on just now (the kernel's pick for port 0). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer().once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

export async function startThrowawayCluster(): Promise<ThrowawayCluster> {
  const bin = ensureBinaries();
  const home = mkdtempSync(path.join(tmpdir(), 'patchcast-pg-'));
  ownForPostgres(home);
  const paths: ClusterPaths = { dataDir: path.join(home, 'data'), socketDir: home, logFile: path.join(home, 'pg.log') };
  const port = await freePort();
  // From a directory the `postgres` user can enter (the checkout may be closed to it).
  const pg = async (program: string, args: string[]): Promise<void> => {
    const [file, argv] = pgCommand(path.join(bin, program), args);
    await execFileAsync(file, argv, { cwd: home });
  };
  let running = false;
  const cluster: ThrowawayCluster = {
    url: (database) => `postgres://${LOCAL_PG_USER}@127.0.0.1:${port}/${database}`,
    async stop() {
      await pg('pg_ctl', ['stop', '-w', '-D', paths.dataDir, '-m', 'fast']);
      running = false;
    },
    async start() {
      await pg('pg_ctl', pgCtlStartArgs(paths, port, []));
      running = true;
    },
    async destroy() {
      live.delete(cluster);
      if (running) await cluster.stop();
      rmSync(home, { recursive: true, force: true });
    },
  };
  live.add(cluster);
  try {
    // --no-sync: a throwaway cluster need not survive a crash of the machine.
    await pg('initdb', [...initdbArgs(paths.dataDir), '--no-sync']);
    await cluster.start();
  } catch (err) {
    await cluster.destroy();
    throw err;
  }
  return cluster;
}
