// Provisions Debian's PostgreSQL for `npm start` and `npm test`: installs the server package when missing
// (as root), creates a private cluster listening on 127.0.0.1 only, and creates databases.
// Trust authentication is used inside that cluster, which is acceptable only because it listens on loopback.
import { execFileSync, spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import { createHash } from 'node:crypto';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';

const isRoot = process.getuid?.() === 0;

function log(msg: string) {
  console.log(`[postgres] ${msg}`);
}

export function findPgBinDir(): string | null {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const majors = readdirSync(base)
    .filter((d) => /^\d+$/.test(d) && existsSync(path.join(base, d, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return majors.length ? path.join(base, majors[0], 'bin') : null;
}

export function ensurePgInstalled(): string {
  let bin = findPgBinDir();
  if (bin) return bin;
  if (!isRoot) {
    throw new Error(
      "PostgreSQL's server is not installed. Install Debian's package first: sudo apt-get install -y postgresql " +
        '(or set DATABASE_URL to a PostgreSQL server you already run).',
    );
  }
  log('server binaries missing: apt-get install -y postgresql (one time)…');
  run('apt-get', ['update', '-qq']);
  run('apt-get', ['install', '-y', '-qq', 'postgresql', 'postgresql-contrib'], { DEBIAN_FRONTEND: 'noninteractive' });
  bin = findPgBinDir();
  if (!bin) throw new Error('apt-get finished but no /usr/lib/postgresql/<major>/bin/initdb was found');
  return bin;
}

function run(cmd: string, args: string[], env: Record<string, string> = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')} failed with exit code ${r.status}`);
}

/** Runs a server binary as the postgres user when we are root (initdb refuses root). */
function asPgUser(bin: string, args: string[], opts: { quiet?: boolean } = {}) {
  const full = isRoot ? ['runuser', ['-u', 'postgres', '--', bin, ...args]] : [bin, args];
  const r = spawnSync(full[0] as string, full[1] as string[], { stdio: opts.quiet ? 'pipe' : 'inherit', cwd: '/' });
  return r;
}

/** The postgres user must be able to reach (search) the folder that holds the cluster's own folders. */
function pgUserCanReach(dir: string): boolean {
  if (!isRoot) return true;
  const r = spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir], { stdio: 'ignore' });
  return r.status === 0;
}

function prepareDir(dir: string) {
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  if (isRoot) {
    const uid = Number(execFileSync('id', ['-u', 'postgres']).toString().trim());
    const gid = Number(execFileSync('id', ['-g', 'postgres']).toString().trim());
    chownSync(dir, uid, gid);
  }
}

export interface Cluster {
  host: string;
  port: number;
  dataDir: string;
  adminUrl: (db?: string) => string;
  startedByUs: boolean;
  stop: () => void;
}

/**
 * Makes sure a private cluster runs on 127.0.0.1:port with its data under `dataDir` (git-ignored).
 * When the postgres user cannot reach that folder (a checkout under a private home), the cluster moves to
 * a folder under the system temp dir named after the checkout, and says so.
 */
export async function ensureCluster(opts: { dataDir: string; port: number; fast?: boolean }): Promise<Cluster> {
  const bin = ensurePgInstalled();
  let dataDir = path.resolve(opts.dataDir);
  const parent = path.dirname(dataDir);
  mkdirSync(parent, { recursive: true });
  if (!pgUserCanReach(parent)) {
    const alt = path.join(os.tmpdir(), `drabyard-pg-${createHash('sha1').update(dataDir).digest('hex').slice(0, 10)}`);
    log(`the postgres user cannot reach ${parent}; using ${alt} instead`);
    mkdirSync(alt, { recursive: true });
    if (isRoot) spawnSync('chmod', ['755', alt]);
    dataDir = path.join(alt, path.basename(dataDir));
  }
  const sockDir = `${dataDir}-run`;
  prepareDir(sockDir);
  if (!existsSync(path.join(dataDir, 'PG_VERSION'))) {
    prepareDir(dataDir);
    log(`initdb ${dataDir}`);
    const r = asPgUser(path.join(bin, 'initdb'), ['-D', dataDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], { quiet: true });
    if (r.status !== 0) throw new Error(`initdb failed: ${r.stderr?.toString()}`);
    // Tuned for a 2-core developer machine; the test cluster trades durability for speed.
    const extra = [
      "listen_addresses = '127.0.0.1'",
      'max_connections = 200',
      'shared_buffers = 256MB',
      ...(opts.fast ? ['fsync = off', 'synchronous_commit = off', 'full_page_writes = off'] : []),
    ].join('\n');
    const confFile = path.join(dataDir, 'postgresql.auto.conf');
    writeFileSync(confFile, `${extra}\n`, { flag: 'a' });
  }
  const url = (db = 'postgres') => `postgres://postgres@127.0.0.1:${opts.port}/${db}`;
  if (await canConnect(url())) {
    log(`cluster already running on 127.0.0.1:${opts.port}`);
    return { host: '127.0.0.1', port: opts.port, dataDir, adminUrl: url, startedByUs: false, stop: () => {} };
  }
  const logFile = `${dataDir}.log`;
  if (isRoot) {
    writeFileSync(logFile, '', { flag: 'a' });
    spawnSync('chown', ['postgres', logFile]);
  }
  const r = asPgUser(path.join(bin, 'pg_ctl'), [
    '-D', dataDir, '-l', logFile, '-w', '-t', '60',
    '-o', `-c listen_addresses=127.0.0.1 -p ${opts.port} -k ${sockDir}`,
    'start',
  ], { quiet: true });
  if (r.status !== 0) throw new Error(`pg_ctl start failed (see ${logFile}): ${r.stderr?.toString()}${r.stdout?.toString()}`);
  log(`cluster started on 127.0.0.1:${opts.port} (data ${dataDir})`);
  const stop = () => {
    asPgUser(path.join(bin, 'pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', 'stop'], { quiet: true });
    log('cluster stopped');
  };
  return { host: '127.0.0.1', port: opts.port, dataDir, adminUrl: url, startedByUs: true, stop };
}

export async function canConnect(url: string): Promise<boolean> {
  const client = new pg.Client({ connectionString: url, connectionTimeoutMillis: 2000 });
  try {
    await client.connect();
    await client.end();
    return true;
  } catch {
    return false;
  }
}

/** Creates the database in the URL when it does not exist; with `fresh` drops it first. */
export async function ensureDatabase(databaseUrl: string, opts: { fresh?: boolean } = {}) {
  const u = new URL(databaseUrl);
  const db = decodeURIComponent(u.pathname.slice(1));
  if (!/^[A-Za-z0-9_]+$/.test(db)) throw new Error(`database name "${db}" must be letters, digits and _`);
  const admin = new URL(databaseUrl);
  admin.pathname = '/postgres';
  const client = new pg.Client({ connectionString: admin.toString() });
  await client.connect();
  try {
    if (opts.fresh) {
      await client.query(`DROP DATABASE IF EXISTS "${db}" WITH (FORCE)`);
    }
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [db]);
    if (found.rowCount === 0) {
      await client.query(`CREATE DATABASE "${db}" TEMPLATE template0 ENCODING 'UTF8'`);
      log(`database ${db} created`);
    }
  } finally {
    await client.end();
  }
}

export function pgTool(name: string): string {
  const bin = ensurePgInstalled();
  return path.join(bin, name);
}

/** Drops a database (used for per-run test databases). */
export async function dropDatabase(databaseUrl: string) {
  const u = new URL(databaseUrl);
  const db = decodeURIComponent(u.pathname.slice(1));
  u.pathname = '/postgres';
  const client = new pg.Client({ connectionString: u.toString() });
  await client.connect();
  try {
    await client.query(`DROP DATABASE IF EXISTS "${db.replace(/"/g, '')}" WITH (FORCE)`);
    const others = await client.query("SELECT count(*)::int AS n FROM pg_database WHERE datname LIKE 'drabyard\\_test\\_%'");
    return { othersRunning: others.rows[0].n as number };
  } finally {
    await client.end();
  }
}
