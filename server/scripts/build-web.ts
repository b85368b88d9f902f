// Builds the production web bundle (expo export) into dist/ when its sources changed since the
// last build; the hash of the sources is kept in dist/.source-hash.
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { repoRoot } from '../config';

const sources = ['app', 'components', 'features', 'shared', 'assets', 'app.json', 'babel.config.js', 'package-lock.json', 'tsconfig.json'];
const distDir = path.join(repoRoot, 'dist');
const hashFile = path.join(distDir, '.source-hash');

function addTree(hash: ReturnType<typeof createHash>, entry: string): void {
  const full = path.join(repoRoot, entry);
  if (!existsSync(full)) return;
  if (statSync(full).isDirectory()) {
    for (const name of readdirSync(full).sort()) {
      if (name.endsWith('.test.ts') || name.endsWith('.test.tsx')) continue;
      addTree(hash, path.join(entry, name));
    }
    return;
  }
  hash.update(entry).update(readFileSync(full));
}

export function sourceHash(): string {
  const hash = createHash('sha256');
  for (const entry of sources) addTree(hash, entry);
  return hash.digest('hex');
}

/** Returns true when it built, false when dist/ was already up to date. */
export function buildWebIfChanged(): boolean {
  const current = sourceHash();
  if (existsSync(hashFile) && readFileSync(hashFile, 'utf8') === current && existsSync(path.join(distDir, 'index.html'))) return false;
  console.log('Building the web app (expo export --platform web)…');
  execFileSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', 'dist'], {
    cwd: repoRoot,
    stdio: 'inherit',
    env: { ...process.env, CI: '1', EXPO_NO_TELEMETRY: '1' },
  });
  writeFileSync(hashFile, current);
  return true;
}

if (require.main === module) buildWebIfChanged();
