// Debian's MariaDB server run privately: data directory inside the repo, bound to 127.0.0.1 only.
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync, openSync } from 'node:fs';
import { createConnection } from 'node:net';
import { join } from 'node:path';
import { capture, log, run, waitFor } from './run.mjs';

const SERVER = '/usr/sbin/mariadbd';

function whoami() {
  return capture('id', ['-un']).stdout.trim() || 'root';
}

/** Install Debian's mariadb-server when the server binary is missing. */
export function ensureMariadbInstalled() {
  if (existsSync(SERVER) && existsSync('/usr/bin/mariadb-install-db')) return;
  aptInstall(['mariadb-server', 'mariadb-client'], 'MariaDB server');
}

/** apt-get install as root, with a clear message when that is not possible. */
export function aptInstall(pkgs, what) {
  if (process.getuid && process.getuid() !== 0) {
    throw new Error(`${what} is missing. Install it as root: apt-get install -y ${pkgs.join(' ')}`);
  }
  if (!existsSync('/usr/bin/apt-get')) {
    throw new Error(`${what} is missing and apt-get is not available; install ${pkgs.join(', ')} by hand.`);
  }
  log(`installing ${what} with apt-get (${pkgs.join(' ')}) …`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const upd = capture('apt-get', ['update', '-qq'], { env });
  if (upd.status !== 0) throw new Error(`apt-get update failed:\n${upd.stderr}`);
  const inst = capture('apt-get', ['install', '-y', '-qq', ...pkgs], { env });
  if (inst.status !== 0) throw new Error(`apt-get install ${pkgs.join(' ')} failed:\n${inst.stderr}`);
}

function paths(p) {
  return {
    socket: join(p.runDir, 'mysqld.sock'),
    pidFile: join(p.runDir, 'mysqld.pid'),
    errLog: join(p.runDir, 'mysqld.err'),
    marker: join(p.dbDir, '.shoalbook-initialised'),
  };
}

function portInUse(port) {
  return new Promise((resolve) => {
    const s = createConnection({ host: '127.0.0.1', port });
    s.once('connect', () => {
      s.destroy();
      resolve(true);
    });
    s.once('error', () => resolve(false));
  });
}

function ping(p) {
  const { socket } = paths(p);
  return (
    capture('mariadb-admin', ['--no-defaults', `--socket=${socket}`, '-uroot', 'ping'], { timeout: 5000 }).status === 0
  );
}

/** Our server's pid, only if that process really runs on our data directory. */
export function ourPid(p) {
  const { pidFile } = paths(p);
  if (!existsSync(pidFile)) return null;
  const pid = Number(readFileSync(pidFile, 'utf8').trim());
  if (!pid) return null;
  try {
    const cmdline = readFileSync(`/proc/${pid}/cmdline`, 'utf8');
    return cmdline.includes(p.dbDir) ? pid : null;
  } catch {
    return null;
  }
}

function initialise(p) {
  const { marker } = paths(p);
  if (existsSync(marker)) return;
  if (existsSync(p.dbDir)) {
    log('the database directory is incomplete (an earlier initialisation stopped half-way): re-initialising it');
    rmSync(p.dbDir, { recursive: true, force: true });
  }
  mkdirSync(p.dbDir, { recursive: true });
  const r = capture('mariadb-install-db', [
    '--no-defaults',
    `--datadir=${p.dbDir}`,
    `--user=${whoami()}`,
    '--auth-root-authentication-method=socket',
    '--skip-test-db',
  ]);
  if (r.status !== 0) throw new Error(`mariadb-install-db failed:\n${r.stdout}\n${r.stderr}`);
  writeFileSync(marker, new Date().toISOString());
}

/** Start the profile's server (or reuse it when it already runs) and make sure the app's database exists. */
export async function startMariadb(p) {
  ensureMariadbInstalled();
  const { socket, pidFile, errLog } = paths(p);
  if (socket.length > 107)
    throw new Error(`socket path too long for MariaDB (${socket.length} > 107): move the repository to a shorter path`);
  if (ourPid(p) && ping(p)) {
    await ensureDatabase(p);
    return { reused: true };
  }
  for (const f of [pidFile, socket]) rmSync(f, { force: true });
  if (await portInUse(p.dbPort)) {
    throw new Error(`port ${p.dbPort} on 127.0.0.1 is already taken by another program; set DB_PORT to a free port`);
  }
  initialise(p);
  const out = openSync(errLog, 'a');
  const child = spawn(
    SERVER,
    [
      '--no-defaults',
      `--datadir=${p.dbDir}`,
      `--socket=${socket}`,
      `--pid-file=${pidFile}`,
      `--log-error=${errLog}`,
      `--port=${p.dbPort}`,
      '--bind-address=127.0.0.1',
      `--user=${whoami()}`,
      '--skip-name-resolve',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
      '--innodb-buffer-pool-size=256M',
      '--max-connections=200',
    ],
    { detached: true, stdio: ['ignore', out, out] },
  );
  let exited = null;
  child.once('exit', (code) => (exited = code ?? -1));
  child.unref();
  try {
    await waitFor(
      () => {
        if (exited !== null)
          throw new Error(`MariaDB exited during start-up (code ${exited}). Its log:\n${tail(errLog)}`);
        return ping(p);
      },
      { timeoutMs: 60000, what: 'MariaDB to answer' },
    );
  } catch (e) {
    throw new Error(`${e.message}\n--- ${errLog} ---\n${tail(errLog)}`);
  }
  await ensureDatabase(p);
  return { reused: false };
}

function tail(file) {
  try {
    return readFileSync(file, 'utf8').split('\n').slice(-20).join('\n');
  } catch {
    return '(no log)';
  }
}

/** Root over the private socket; the app itself uses its own least-privileged user. */
export function sqlAsRoot(p, sql) {
  const { socket } = paths(p);
  const r = capture('mariadb', ['--no-defaults', `--socket=${socket}`, '-uroot', '-e', sql]);
  if (r.status !== 0) throw new Error(`SQL failed: ${r.stderr}`);
  return r.stdout;
}

export async function ensureDatabase(p, dbName = p.dbName) {
  const pw = p.secrets.dbPassword.replace(/'/g, "''");
  sqlAsRoot(
    p,
    [
      `CREATE DATABASE IF NOT EXISTS \`${dbName}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
      `CREATE USER IF NOT EXISTS '${p.dbUser}'@'127.0.0.1' IDENTIFIED BY '${pw}'`,
      `ALTER USER '${p.dbUser}'@'127.0.0.1' IDENTIFIED BY '${pw}'`,
      `GRANT SELECT, INSERT, UPDATE, DELETE, CREATE, DROP, INDEX, ALTER, REFERENCES, CREATE TEMPORARY TABLES, LOCK TABLES ON \`${dbName}\`.* TO '${p.dbUser}'@'127.0.0.1'`,
    ].join(';'),
  );
}

export function dropDatabase(p, dbName = p.dbName) {
  sqlAsRoot(p, `DROP DATABASE IF EXISTS \`${dbName}\``);
}

/** Stop by SIGTERM and wait for the process to go. */
export async function stopMariadb(p) {
  const pid = ourPid(p);
  if (!pid) return false;
  process.kill(pid, 'SIGTERM');
  await waitFor(
    () => {
      try {
        process.kill(pid, 0);
        return false;
      } catch {
        return true;
      }
    },
    { timeoutMs: 30000, what: 'MariaDB to stop' },
  );
  return true;
}

export function mariadbSocket(p) {
  return paths(p).socket;
}

export { run };
