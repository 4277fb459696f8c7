// `node scripts/backup.mjs dump|restore [profile] [file]` — a consistent SQL dump of a profile's database, and
// its restore. The dump runs `mariadb-dump --single-transaction` (one snapshot, no table locks, so the app keeps
// running) as root over the profile's private socket. Photo files (UPLOAD_DIR) are not in the dump: copy that
// folder beside it. Restore replaces every table in the dump; stop the app first, or writes made meanwhile are lost.
import { spawn } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, openSync, readFileSync, readSync, renameSync, rmSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { ensureDatabase, mariadbSocket, startMariadb } from './lib/mariadb.mjs';
import { profile } from './lib/profile.mjs';
import { fail, log } from './lib/run.mjs';

/** mariadb-dump ends a complete dump with this comment; a cut-off file lacks it. */
const COMPLETE_MARK = '-- Dump completed';

/** Exit code of a client program whose stdin/stdout are files. */
function runClient(cmd, args, { stdin = 'ignore', stdout = 'ignore' } = {}) {
  return new Promise((resolvePromise, reject) => {
    const child = spawn(cmd, args, { stdio: [stdin, stdout, 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (c) => (stderr += c));
    child.once('error', reject);
    child.once('exit', (code) => (code === 0 ? resolvePromise() : reject(new Error(`${cmd} exited with ${code}: ${stderr.trim()}`))));
  });
}

function defaultFile(p) {
  const stamp = new Date().toISOString().replace(/[:.]/g, '-');
  return join(p.dataDir, 'backups', `${p.dbName}-${stamp}.sql`);
}

/** The last bytes of a file, to check the completion mark without reading a large dump whole. */
function tailOf(file, bytes = 512) {
  const size = statSync(file).size;
  const fd = openSync(file, 'r');
  try {
    const buf = Buffer.alloc(Math.min(bytes, size));
    readSync(fd, buf, 0, buf.length, size - buf.length);
    return buf.toString('utf8');
  } finally {
    closeSync(fd);
  }
}

/** Dump the profile's database to `file` (written to a temporary name first, so a failed dump never looks complete). */
export async function dump(p, file = defaultFile(p)) {
  await startMariadb(p);
  mkdirSync(dirname(file), { recursive: true });
  const partial = `${file}.partial`;
  const out = openSync(partial, 'w', 0o600);
  try {
    await runClient(
      'mariadb-dump',
      ['--no-defaults', `--socket=${mariadbSocket(p)}`, '-uroot', '--single-transaction', '--routines', '--triggers', '--hex-blob', '--default-character-set=utf8mb4', p.dbName],
      { stdout: out },
    );
  } catch (e) {
    rmSync(partial, { force: true });
    throw e;
  } finally {
    closeSync(out);
  }
  if (!tailOf(partial).includes(COMPLETE_MARK)) {
    rmSync(partial, { force: true });
    throw new Error('mariadb-dump wrote an incomplete file');
  }
  renameSync(partial, file);
  return file;
}

/** Restore `file` (a complete dump made by `dump`) into the profile's database. */
export async function restore(p, file) {
  if (!file) throw new Error('name the dump file to restore');
  if (!existsSync(file)) throw new Error(`no such file: ${file}`);
  const head = readFileSync(file, { encoding: 'utf8', flag: 'r' }).slice(0, 400);
  if (!/MariaDB dump|mysqldump/i.test(head) || !tailOf(file).includes(COMPLETE_MARK)) {
    throw new Error(`${file} is not a complete mariadb-dump file; nothing was restored`);
  }
  await startMariadb(p);
  await ensureDatabase(p);
  const input = openSync(file, 'r');
  try {
    await runClient('mariadb', ['--no-defaults', `--socket=${mariadbSocket(p)}`, '-uroot', '--default-character-set=utf8mb4', p.dbName], { stdin: input });
  } finally {
    closeSync(input);
  }
}

const isMain = process.argv[1] && resolve(process.argv[1]) === resolve(new URL(import.meta.url).pathname);
if (isMain) {
  const [cmd, name = 'demo', file] = process.argv.slice(2);
  try {
    const p = profile(name);
    if (cmd === 'dump') {
      const written = await dump(p, file ? resolve(file) : undefined);
      log(`dumped ${p.dbName} (${p.name}) to ${written}; photo files stay in ${p.uploadDir}`);
    } else if (cmd === 'restore') {
      await restore(p, file && resolve(file));
      log(`restored ${p.dbName} (${p.name}) from ${file}`);
    } else {
      fail('usage: node scripts/backup.mjs dump|restore [demo|test|bench] [file]');
    }
  } catch (e) {
    fail(e.message);
  }
}
