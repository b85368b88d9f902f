// A private PostgreSQL cluster under .data/pg on 127.0.0.1, created and started by our scripts.
// Skipped entirely when DATABASE_URL points at another server.
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { chownSync, existsSync, mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import pg from 'pg';
import { localPgPort, repoRoot } from '../config';
import { ensureDebianPackages, isRoot } from './system';

export const LOCAL_PG_PORT = localPgPort();
export const LOCAL_PG_USER = 'patchcast';

/**
 * The cluster lives in .data/ of the checkout. As root, the `postgres` user must be able to reach
 * that folder; when a parent is closed to it (a checkout under /root, say) the cluster goes to
 * /var/lib/postgresql/patchcast-<hash of the checkout path> instead, and we say so.
 */
function clusterHome(): string {
  const local = path.join(repoRoot, '.data');
  mkdirSync(local, { recursive: true });
  if (!isRoot() || spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', local]).status === 0) return local;
  const hash = createHash('sha256').update(repoRoot).digest('hex').slice(0, 12);
  const home = `/var/lib/postgresql/patchcast-${hash}`;
  console.log(`The postgres user cannot reach ${local}; keeping the cluster in ${home}.`);
  mkdirSync(home, { recursive: true });
  return home;
}

export type ClusterPaths = { dataDir: string; socketDir: string; logFile: string };

function clusterPaths(): ClusterPaths {
  const home = clusterHome();
  return { dataDir: path.join(home, 'pg'), socketDir: path.join(home, 'pg-socket'), logFile: path.join(home, 'pg.log') };
}

function binDir(): string | null {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const versions = readdirSync(base).filter((v) => existsSync(path.join(base, v, 'bin', 'initdb'))).sort((a, b) => Number(b) - Number(a));
  return versions.length ? path.join(base, versions[0], 'bin') : null;
}

/** The command line of a PostgreSQL program: it refuses to run as root, so as root the cluster belongs to the `postgres` user. */
export function pgCommand(program: string, args: string[]): [string, string[]] {
  return isRoot() ? ['runuser', ['-u', 'postgres', '--', program, ...args]] : [program, args];
}

function runPg(program: string, args: string[]): void {
  execFileSync(...pgCommand(program, args), { stdio: 'inherit' });
}

export function ownForPostgres(dir: string): void {
  mkdirSync(dir, { recursive: true });
  if (isRoot()) {
    const uid = Number(execFileSync('id', ['-u', 'postgres']).toString().trim());
    const gid = Number(execFileSync('id', ['-g', 'postgres']).toString().trim());
    chownSync(dir, uid, gid);
  }
}

export function ensureBinaries(): string {
  let bin = binDir();
  if (!bin) {
    ensureDebianPackages({ postgresql: '/usr/lib/postgresql/__probe__' }, 'the local database');
    bin = binDir();
  }
  if (!bin) throw new Error('PostgreSQL server binaries not found under /usr/lib/postgresql: install Debian\'s postgresql package.');
  return bin;
}

function isRunning(bin: string, dataDir: string): boolean {
  return spawnSync(...pgCommand(path.join(bin, 'pg_ctl'), ['status', '-D', dataDir])).status === 0;
}

/** initdb's arguments: trust on loopback only, as the cluster listens on 127.0.0.1 and a private socket directory. */
export const initdbArgs = (dataDir: string): string[] => ['-D', dataDir, '-U', LOCAL_PG_USER, '-A', 'trust', '-E', 'UTF8', '--locale=C.UTF-8'];

/** pg_ctl's arguments to start a cluster on 127.0.0.1:`port` with `settings` (name=value), waiting until it accepts connections. */
export function pgCtlStartArgs({ dataDir, socketDir, logFile }: ClusterPaths, port: number, settings: string[]): string[] {
  const options = [`-c listen_addresses=127.0.0.1 -p ${port} -c unix_socket_directories=${socketDir}`, ...settings.map((s) => `-c ${s}`)].join(' ');
  return ['start', '-w', '-t', '60', '-D', dataDir, '-l', logFile, '-o', options];
}

export type LocalCluster = { adminUrl: (database: string) => string; stop(): void; startedHere: boolean };

/** Creates the cluster if absent and starts it if stopped. `stop()` only stops what this call started. */
export function ensureLocalCluster(): LocalCluster {
  const bin = ensureBinaries();
  const paths = clusterPaths();
  const { dataDir, socketDir, logFile } = paths;
  if (!existsSync(path.join(dataDir, 'PG_VERSION'))) {
    console.log(`Creating a PostgreSQL cluster in ${dataDir}…`);
    ownForPostgres(dataDir);
    runPg(path.join(bin, 'initdb'), initdbArgs(dataDir));
  }
  ownForPostgres(socketDir);
  if (isRoot()) {
    writeFileSync(logFile, '', { flag: 'a' });
    execFileSync('chown', ['postgres:postgres', logFile]);
  }
  let startedHere = false;
  if (!isRunning(bin, dataDir)) {
    runPg(path.join(bin, 'pg_ctl'), pgCtlStartArgs(paths, LOCAL_PG_PORT, ['synchronous_commit=off', 'max_connections=200']));
    startedHere = true;
  }
  return {
    adminUrl: (database) => `postgres://${LOCAL_PG_USER}@127.0.0.1:${LOCAL_PG_PORT}/${database}`,
    startedHere,
    stop: () => {
      if (startedHere) runPg(path.join(bin, 'pg_ctl'), ['stop', '-D', dataDir, '-m', 'fast']);
    },
  };
}

/** Database name from a connection URL. */
export function databaseName(url: string): string {
  return decodeURIComponent(new URL(url).pathname.replace(/^\//, ''));
}

/** Creates the database of `url` when it does not exist (connecting to the `postgres` database). */
export async function ensureDatabase(url: string): Promise<void> {
  const name = databaseName(url);
  const admin = new URL(url);
  admin.pathname = '/postgres';
  const client = new pg.Client({ connectionString: admin.toString() });
  await client.connect();
  try {
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE "${name.replace(/"/g, '""')}"`);
  } finally {
    await client.end();
  }
}
