// Project-local PostgreSQL clusters for development and tests, kept under .data/postgres/<name>.
import { createHash } from 'node:crypto';
import {
  existsSync,
  lstatSync,
  mkdirSync,
  readFileSync,
  readdirSync,
  realpathSync,
  rmSync,
  statSync,
  symlinkSync,
} from 'node:fs';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { DATA_DIR, ROOT, capture, fail, isRoot, note, runInherit, warn } from './run.mjs';

/** Named clusters; ports stay off 5432 so a system PostgreSQL can run beside them. */
const CLUSTERS = {
  dev: { port: 54329, database: 'stratochron' },
  test: { port: 54339, database: 'stratochron_test' },
};

/** initdb, pg_ctl and postgres refuse to run as root, so as root they run as this user. */
const SERVER_USER = 'postgres';

// Unix socket paths are limited to 107 bytes on Linux.
const MAX_SOCKET_PATH = 100;

/** Folder holding initdb/pg_ctl/postgres: the newest Debian-packaged version, else pg_config's. */
export function findBinDir() {
  const debianRoot = '/usr/lib/postgresql';
  if (existsSync(debianRoot)) {
    const versions = readdirSync(debianRoot)
      .filter((version) => existsSync(join(debianRoot, version, 'bin', 'initdb')))
      .sort((a, b) => Number(b) - Number(a));
    if (versions.length > 0) {
      return join(debianRoot, versions[0], 'bin');
    }
  }
  const pgConfig = capture('pg_config', ['--bindir']);
  const binDir = pgConfig.stdout.trim();
  if (pgConfig.status === 0 && existsSync(join(binDir, 'initdb'))) {
    return binDir;
  }
  return null;
}

/** A client tool (psql, pg_dump, ...) from the server's bin folder, else whatever PATH finds. */
export function clientTool(name) {
  const binDir = findBinDir();
  return binDir && existsSync(join(binDir, name)) ? join(binDir, name) : name;
}

function ensureBinDir() {
  const found = findBinDir();
  if (found) {
    return found;
  }
  if (!isRoot) {
    fail(
      'PostgreSQL server binaries (initdb, pg_ctl) were not found.\n' +
        '  Install them, e.g. `sudo apt-get install -y postgresql` on Debian/Ubuntu,\n' +
        '  or point DATABASE_URL at an existing PostgreSQL server.',
    );
  }
  note('PostgreSQL server binaries not found: installing the Debian package postgresql');
  const status = runInherit('sh', ['-c', 'apt-get update && apt-get install -y postgresql'], {
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
  const installed = status === 0 ? findBinDir() : null;
  if (!installed) {
    fail('installing postgresql with apt-get failed (see the output above)');
  }
  return installed;
}

function serverUserIds() {
  const uid = capture('id', ['-u', SERVER_USER]);
  const gid = capture('id', ['-g', SERVER_USER]);
  return uid.status === 0 ? { uid: Number(uid.stdout), gid: Number(gid.stdout) } : null;
}

function ensureServerUser() {
  if (!isRoot || serverUserIds()) {
    return;
  }
  note(`creating the system user ${SERVER_USER} to run PostgreSQL`);
  const created = capture('useradd', ['--system', '--user-group', '--no-create-home', '--shell', '/bin/sh', SERVER_USER]);
  if (created.status !== 0) {
    fail(`useradd ${SERVER_USER} failed: ${created.stderr.trim()}`);
  }
}

/** Command line for a server program, switched to the server user when running as root. */
function asServerUser(program, args) {
  return isRoot ? ['runuser', ['-u', SERVER_USER, '--', program, ...args]] : [program, args];
}

function runServerProgram(binDir, program, args) {
  const [command, commandArgs] = asServerUser(join(binDir, program), args);
  // cwd '/' because the server user may not be allowed into the caller's working folder.
  return capture(command, commandArgs, { cwd: '/' });
}

function chownToServerUser(path, recursive) {
  const ids = serverUserIds();
  if (isRoot && ids && statSync(path).uid !== ids.uid) {
    const chown = capture('chown', [...(recursive ? ['-R'] : []), `${ids.uid}:${ids.gid}`, path]);
    if (chown.status !== 0) {
      fail(`chown of ${path} failed: ${chown.stderr.trim()}`);
    }
  }
}

/** Where a cluster's data lives now: `.data/postgres/<name>`, or the target it links to. */
function locateDataDir(name) {
  const local = join(DATA_DIR, 'postgres', name);
  return existsSync(local) && lstatSync(local).isSymbolicLink() ? realpathSync(local) : local;
}

/**
 * As root, the data folder must be reachable by the server user. When a parent of the project
 * is closed to it, the cluster moves to a folder that user owns and `.data/postgres/<name>`
 * becomes a link to it, so the project folder still shows where the data is.
 */
function prepareDataDir(name) {
  const parent = join(DATA_DIR, 'postgres');
  mkdirSync(parent, { recursive: true, mode: 0o755 });
  const local = join(parent, name);
  if (!isRoot || (existsSync(local) && lstatSync(local).isSymbolicLink())) {
    return locateDataDir(name);
  }
  const [command, args] = asServerUser('test', ['-x', parent]);
  if (capture(command, args).status === 0) {
    return local;
  }
  const projectKey = createHash('sha256').update(ROOT).digest('hex').slice(0, 12);
  const external = join('/var/lib/stratochron', projectKey, name);
  mkdirSync(join(external, '..'), { recursive: true, mode: 0o755 });
  mkdirSync(external, { recursive: true, mode: 0o700 });
  chownToServerUser(external, true);
  if (!existsSync(local)) {
    symlinkSync(external, local);
  }
  warn(`${SERVER_USER} cannot reach ${parent}; cluster ${name} lives in ${external} (linked from ${local})`);
  return external;
}

/** Socket folder inside the cluster folder, unless that path is too long for a Unix socket. */
function socketDirFor(name, dataDir, port) {
  const inside = join(dataDir, 'socket');
  if (`${inside}/.s.PGSQL.${port}`.length <= MAX_SOCKET_PATH) {
    return inside;
  }
  const projectKey = createHash('sha256').update(ROOT).digest('hex').slice(0, 12);
  return join('/tmp', `stratochron-${projectKey}-${name}`);
}

function clusterFor(name, dataDir, binDir) {
  const settings = CLUSTERS[name];
  if (!settings) {
    fail(`unknown cluster "${name}" (known: ${Object.keys(CLUSTERS).join(', ')})`);
  }
  const port = Number(process.env.STRATOCHRON_PG_PORT ?? settings.port);
  if (!Number.isInteger(port) || port <= 0 || port > 65535) {
    fail(`STRATOCHRON_PG_PORT must be a TCP port number, got "${process.env.STRATOCHRON_PG_PORT}"`);
  }
  return { name, binDir, dataDir, socketDir: socketDirFor(name, dataDir, port), port, database: settings.database };
}

function initCluster(cluster) {
  note(`creating PostgreSQL cluster "${cluster.name}" in ${cluster.dataDir}`);
  // Without PG_VERSION the folder is at most a failed initdb's leftovers: start over.
  rmSync(cluster.dataDir, { recursive: true, force: true });
  mkdirSync(cluster.dataDir, { recursive: true, mode: 0o700 });
  chownToServerUser(cluster.dataDir, true);
  const result = runServerProgram(cluster.binDir, 'initdb', [
    '-D',
    cluster.dataDir,
    '-A',
    'trust',
    '-U',
    'postgres',
    '--encoding=UTF8',
    '--locale=C',
  ]);
  if (result.status !== 0) {
    fail(`initdb failed for cluster "${cluster.name}":\n${result.stdout}${result.stderr}`);
  }
}

/** The postmaster recorded in postmaster.pid, or null when none is alive. */
function runningPostmaster(dataDir) {
  const pidFile = join(dataDir, 'postmaster.pid');
  if (!existsSync(pidFile)) {
    return null;
  }
  const [pidLine, , , portLine] = readFileSync(pidFile, 'utf8').split('\n');
  const pid = Number(pidLine);
  try {
    process.kill(pid, 0);
  } catch (error) {
    if (error.code !== 'EPERM') {
      return null;
    }
  }
  // A container restart can hand the old postmaster's pid to another program, which fools the
  // liveness check that `pg_ctl status` relies on; the process name settles it. A killed
  // postmaster may linger as a zombie until its parent reaps it.
  const stat = `/proc/${pid}/stat`;
  if (existsSync('/proc/self')) {
    const fields = existsSync(stat) ? readFileSync(stat, 'utf8') : '';
    if (!fields.includes('(postgres)') || / \(postgres\) Z /.test(fields)) {
      return null;
    }
  }
  return { pid, port: Number(portLine) };
}

/** Lock files left by a postmaster that died without cleaning up would block the next start. */
function clearStaleLocks(cluster) {
  rmSync(join(cluster.dataDir, 'postmaster.pid'), { force: true });
  if (existsSync(cluster.socketDir)) {
    for (const entry of readdirSync(cluster.socketDir)) {
      if (entry.startsWith('.s.PGSQL.')) {
        rmSync(join(cluster.socketDir, entry), { force: true });
      }
    }
  }
}

function logTail(cluster, lines = 20) {
  const log = join(cluster.dataDir, 'server.log');
  return existsSync(log) ? readFileSync(log, 'utf8').trimEnd().split('\n').slice(-lines).join('\n') : '(no server.log)';
}

async function waitUntilReady(cluster) {
  for (let attempt = 0; attempt < 60; attempt += 1) {
    const ready = capture(join(cluster.binDir, 'pg_isready'), ['-q', '-h', '127.0.0.1', '-p', String(cluster.port), '-U', 'postgres']);
    if (ready.status === 0) {
      return;
    }
    await sleep(500);
  }
  fail(`PostgreSQL cluster "${cluster.name}" did not accept connections on port ${cluster.port}:\n${logTail(cluster)}`);
}

function serverOptions(cluster) {
  const options = ['-p', String(cluster.port), '-k', `'${cluster.socketDir}'`, '-c', 'listen_addresses=127.0.0.1'];
  if (cluster.name === 'test') {
    // The test database is thrown away every run, so crash safety only costs time.
    options.push('-c', 'fsync=off', '-c', 'synchronous_commit=off', '-c', 'full_page_writes=off');
  }
  return options.join(' ');
}

async function startCluster(cluster) {
  const running = runningPostmaster(cluster.dataDir);
  if (running && running.port === cluster.port) {
    await waitUntilReady(cluster);
    return;
  }
  if (running) {
    note(`cluster "${cluster.name}" runs on port ${running.port}; restarting it on ${cluster.port}`);
    if (!stopDataDir(cluster)) {
      fail(`could not stop cluster "${cluster.name}" to move it to port ${cluster.port}`);
    }
  }
  clearStaleLocks(cluster);
  mkdirSync(cluster.socketDir, { recursive: true, mode: 0o700 });
  chownToServerUser(cluster.socketDir, false);
  note(`starting PostgreSQL cluster "${cluster.name}" on 127.0.0.1:${cluster.port}`);
  const result = runServerProgram(cluster.binDir, 'pg_ctl', [
    '-D',
    cluster.dataDir,
    '-l',
    join(cluster.dataDir, 'server.log'),
    '-o',
    serverOptions(cluster),
    '-w',
    '-t',
    '60',
    'start',
  ]);
  if (result.status !== 0) {
    fail(`pg_ctl start failed for cluster "${cluster.name}":\n${result.stderr.trim()}\n${logTail(cluster)}`);
  }
  await waitUntilReady(cluster);
}

/**
 * Create the named cluster if needed (initdb, trust auth for local connections) and make sure
 * it is running; returns its settings ({ name, binDir, dataDir, socketDir, port, database }).
 */
export async function ensureCluster(name) {
  const binDir = ensureBinDir();
  ensureServerUser();
  const cluster = clusterFor(name, prepareDataDir(name), binDir);
  if (!existsSync(join(cluster.dataDir, 'PG_VERSION'))) {
    initCluster(cluster);
  }
  chownToServerUser(cluster.dataDir, true);
  await startCluster(cluster);
  return cluster;
}

function psql(cluster, sql) {
  return capture(join(cluster.binDir, 'psql'), [
    '-h',
    '127.0.0.1',
    '-p',
    String(cluster.port),
    '-U',
    'postgres',
    '-d',
    'postgres',
    '-v',
    'ON_ERROR_STOP=1',
    '-tAc',
    sql,
  ]);
}

function psqlOrFail(cluster, sql) {
  const result = psql(cluster, sql);
  if (result.status !== 0) {
    fail(`psql failed on cluster "${cluster.name}" (${sql}): ${result.stderr.trim()}`);
  }
  return result.stdout.trim();
}

/** Create the database if it does not exist yet. */
export function ensureDatabase(cluster, database = cluster.database) {
  const exists = psqlOrFail(cluster, `SELECT 1 FROM pg_database WHERE datname = '${database}'`);
  if (exists !== '1') {
    note(`creating database ${database}`);
    psqlOrFail(cluster, `CREATE DATABASE "${database}"`);
  }
}

/** Drop the database (ending its sessions) and create it empty. */
export function resetDatabase(cluster, database = cluster.database) {
  psqlOrFail(cluster, `DROP DATABASE IF EXISTS "${database}" WITH (FORCE)`);
  psqlOrFail(cluster, `CREATE DATABASE "${database}"`);
}

export function databaseUrlFor(cluster, database = cluster.database) {
  return `postgres://postgres@127.0.0.1:${cluster.port}/${database}`;
}

/** DATABASE_URL from the environment, else the named local cluster's database (created as needed). */
export async function ensureDatabaseUrl(name) {
  if (process.env.DATABASE_URL) {
    return process.env.DATABASE_URL;
  }
  const cluster = await ensureCluster(name);
  ensureDatabase(cluster);
  return databaseUrlFor(cluster);
}

function stopDataDir(cluster) {
  const result = runServerProgram(cluster.binDir, 'pg_ctl', ['-D', cluster.dataDir, '-m', 'fast', '-w', '-t', '60', 'stop']);
  if (result.status !== 0) {
    warn(`pg_ctl stop failed for cluster "${cluster.name}": ${result.stderr.trim()}`);
  }
  return result.status === 0;
}

/**
 * Stop the named cluster if it is running (fast mode: sessions are ended, data is flushed).
 * Returns whether it was running; a failed stop is reported and sets a failing exit code.
 */
export function stopCluster(name) {
  const dataDir = locateDataDir(name);
  const binDir = findBinDir();
  if (!binDir || !runningPostmaster(dataDir)) {
    return false;
  }
  note(`stopping PostgreSQL cluster "${name}"`);
  if (!stopDataDir(clusterFor(name, dataDir, binDir))) {
    process.exitCode = 1;
  }
  return true;
}
