#!/usr/bin/env node
// Entry point of `npm start`, `npm run dev` and `npm test`. Plain JavaScript on purpose: it must run on a
// fresh clone before node_modules exists, install the dependencies, then hand over to the TypeScript runner.
import { spawnSync, spawn } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const mode = process.argv[2] ?? 'start';

// Install when node_modules is missing, or when package-lock.json changed since the last install (a pull).
const installed = path.join(root, 'node_modules', '.package-lock.json');
const stale = existsSync(installed) && statSync(path.join(root, 'package-lock.json')).mtimeMs > statSync(installed).mtimeMs + 1000;
if (!existsSync(path.join(root, 'node_modules', '.bin', 'tsx')) || stale) {
  console.log(`[drabyard] ${stale ? 'package-lock.json changed' : 'node_modules is missing'}: running npm ci…`);
  const lock = existsSync(path.join(root, 'package-lock.json'));
  const r = spawnSync('npm', [lock ? 'ci' : 'install', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) {
    console.error('[drabyard] dependency install failed; see the npm output above.');
    process.exit(r.status ?? 1);
  }
}

// node with tsx's loader rather than the tsx command: the command's own signal relay escalates to SIGKILL when a
// child is slow to stop, and Ctrl-C reaches the runner twice (from the terminal and from here), which could end
// it before it has stopped its PostgreSQL cluster.
const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'scripts', 'run.ts'), mode, ...process.argv.slice(3)], {
  cwd: root,
  stdio: 'inherit',
});
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => child.kill(sig));
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
