// Debian packages the project needs at run or test time, installed with apt-get when missing.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

let aptUpdated = false;

export function isRoot(): boolean {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

/** Installs the Debian packages whose probe file is missing; throws a clear message when that cannot be done. */
export function ensureDebianPackages(packages: Record<string, string>, why: string): void {
  const missing = Object.entries(packages)
    .filter(([, probe]) => !existsSync(probe))
    .map(([name]) => name);
  if (missing.length === 0) return;
  if (!isRoot() || spawnSync('which', ['apt-get']).status !== 0) {
    throw new Error(`${why} needs the Debian packages ${missing.join(', ')}: install them (sudo apt-get install -y ${missing.join(' ')}) and run again.`);
  }
  console.log(`Installing ${missing.join(', ')} with apt-get (${why})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    execFileSync('apt-get', ['update', '-q'], { stdio: 'inherit', env });
    aptUpdated = true;
  }
  execFileSync('apt-get', ['install', '-y', '-q', '--no-install-recommends', ...missing], { stdio: 'inherit', env });
}
