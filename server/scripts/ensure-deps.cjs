// Runs before anything else in `npm start` / `npm test`, so it is plain JavaScript: installs the
// npm dependencies when they are missing or older than package-lock.json.
const { execSync } = require('node:child_process');
const { existsSync, statSync } = require('node:fs');
const path = require('node:path');

const root = path.resolve(__dirname, '..', '..');
const marker = path.join(root, 'node_modules', '.package-lock.json');
const lock = path.join(root, 'package-lock.json');
const stale = !existsSync(marker) || (existsSync(lock) && statSync(lock).mtimeMs > statSync(marker).mtimeMs);
if (stale) {
  console.log('Installing npm dependencies (first run or package-lock.json changed)…');
  execSync(existsSync(lock) ? 'npm ci --no-audit --no-fund' : 'npm install --no-audit --no-fund', { cwd: root, stdio: 'inherit' });
}
