#!/usr/bin/env node
// Entry point of `npm start`, `npm run dev` and `npm test`. Plain JavaScript on purpose: it must run on a
// fresh clone before node_modules exists, install the dependencies, then hand over to the TypeScript runner.
import { spawnSync, spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const mode = process.argv[2] ?? 'start';

if (!existsSync(path.join(root, 'node_modules', '.bin', 'tsx'))) {
  console.log('[drabyard] node_modules is missing: running npm ci (first start only)…');
  const lock = existsSync(path.join(root, 'package-lock.json'));
  const r = spawnSync('npm', [lock ? 'ci' : 'install', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) {
    console.error('[drabyard] dependency install failed; see the npm output above.');
    process.exit(r.status ?? 1);
  }
}

const tsx = path.join(root, 'node_modules', '.bin', 'tsx');
const child = spawn(tsx, [path.join(root, 'scripts', 'run.ts'), mode, ...process.argv.slice(3)], {
  cwd: root,
  stdio: 'inherit',
});
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => child.kill(sig));
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
