// `node scripts/backup.mjs dump|restore [profile] [file]` — a backup of a profile's database and photo files in one
// tar archive, and its restore. The archive holds `database.sql` (`mariadb-dump --single-transaction`: one
// snapshot, no table locks, so the app keeps running; run as root over the profile's private socket) and
// `uploads/` (the photo files, UPLOAD_DIR). Restore checks the whole archive before it touches anything, then
// replaces every table in the dump and the whole uploads folder; stop the app first, or writes made meanwhile are
// lost. A plain `.sql` dump from before photos were included still restores, the database only.
import { spawn } from 'node:child_process';
import {
  closeSync,
  existsSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  openSync,
  readdirSync,
  readSync,
  renameSync,
  rmSync,
  statSync,
} from 'node:fs';
import { basename, dirname, join, relative, resolve } from 'node:path';
import { ensureDatabase, mariadbSocket, startMariadb } from './lib/mariadb.mjs';
import { profile } from './lib/profile.mjs';
import { fail, log } from './lib/run.mjs';

/** mariadb-dump ends a complete dump with this comment; a cut-off file lacks it. */
const COMPLETE_MARK = '-- Dump completed';
/** The archive's members: the SQL dump and the photo folder. */
const SQL_MEMBER = 'database.sql';
const UPLOADS_MEMBER = 'uploads';

/** Run a client program whose stdin/stdout are files; resolves with its stdout when piped, rejects on a bad exit. */
function runClient(cmd, args, { stdin = 'ignore', stdout = 'ignore', okCodes = [0] } = {}) {
  return new Promise((resolvePromise, reject) => {
    const child = spawn(cmd, args, { stdio: [stdin, stdout, 'pipe'] });
    let out = '';
    let stderr = '';
    child.stdout?.on('data', (c) => (out += c));
    child.stderr.on('data', (c) => (stderr += c));
    child.once('error', reject);
    child.once('exit', (code) =>
      okCodes.includes(code) ? resolvePromise(out) : reject(new Error(`${cmd} exited with ${code}: ${stderr.trim()}`)),
    );
  });
}

function defaultFile(p) {
  const stamp = new Date().toISOString().replace(/[:.]/g, '-');
  return join(p.dataDir, 'backups', `${p.dbName}-${stamp}.tar`);
}

/** The first and last bytes of a file, to recognise a dump without reading a large one whole. */
function bytesOf(file, { head = 0, tail = 0 }) {
  const size = statSync(file).size;
  const fd = openSync(file, 'r');
  try {
    const read = (position, length) => {
      const buf = Buffer.alloc(Math.min(length, size));
      readSync(fd, buf, 0, buf.length, position);
      return buf;
    };
    return head ? read(0, head) : read(Math.max(0, size - tail), tail);
  } finally {
    closeSync(fd);
  }
}

/** A complete mariadb-dump file: its header and the completion mark at its end. */
function isCompleteDump(file) {
  const head = bytesOf(file, { head: 400 }).toString('utf8');
  return /MariaDB dump|mysqldump/i.test(head) && bytesOf(file, { tail: 512 }).toString('utf8').includes(COMPLETE_MARK);
}

/** A tar archive (POSIX ustar or GNU): "ustar" at offset 257 of the first header block. */
function isTar(file) {
  return statSync(file).size >= 512 && bytesOf(file, { head: 512 }).toString('latin1', 257, 262) === 'ustar';
}

/** tar arguments that add the photo folder as `uploads/…`, whatever the folder is called on disk. */
function uploadsArgs(p) {
  return [
    '--ignore-failed-read',
    '--warning=no-file-changed',
    `--transform=s,^\\.,${UPLOADS_MEMBER},`,
    '-C',
    p.uploadDir,
    '.',
  ];
}

/** GNU tar exits 1 when a file changed while it was archived (an upload meanwhile): the second pass adds it. */
const TAR_WRITE = { okCodes: [0, 1] };

/** Everything under a folder (Node's recursive listing), as paths relative to it with their kind. */
function entriesUnder(dir) {
  return readdirSync(dir, { recursive: true, withFileTypes: true }).map((e) => ({
    path: relative(dir, join(e.parentPath, e.name)),
    file: e.isFile(),
    folder: e.isDirectory(),
  }));
}

/**
 * Write the profile's database and photo files to the archive `file` (built under a temporary name first, so a
 * failed backup never looks complete). Returns the file and how many photo files it holds.
 */
export async function dump(p, file = defaultFile(p)) {
  await startMariadb(p);
  mkdirSync(dirname(file), { recursive: true });
  mkdirSync(p.uploadDir, { recursive: true, mode: 0o700 });
  const partial = `${file}.partial`;
  const work = mkdtempSync(join(dirname(file), '.backup-'));
  try {
    // Photo files are only ever added or deleted, never changed. Archive them before the database snapshot, so a
    // photo deleted meanwhile is still there for its row; afterwards add those written since (2 s of margin for
    // coarse file times), so a photo uploaded meanwhile is there too. A file without a row is harmless.
    const since = Math.floor(Date.now() / 1000) - 2;
    closeSync(openSync(partial, 'w', 0o600)); // the archive holds password hashes: owner-only, as tar keeps the mode
    await runClient('tar', ['--create', '--format=gnu', `--file=${partial}`, ...uploadsArgs(p)], TAR_WRITE);
    const sql = join(work, SQL_MEMBER);
    const out = openSync(sql, 'w', 0o600);
    try {
      await runClient(
        'mariadb-dump',
        [
          '--no-defaults',
          `--socket=${mariadbSocket(p)}`,
          '-uroot',
          '--single-transaction',
          '--routines',
          '--triggers',
          '--hex-blob',
          '--default-character-set=utf8mb4',
          p.dbName,
        ],
        { stdout: out },
      );
    } finally {
      closeSync(out);
    }
    if (!isCompleteDump(sql)) throw new Error('mariadb-dump wrote an incomplete file');
    await runClient(
      'tar',
      ['--append', `--file=${partial}`, `--newer-mtime=@${since}`, ...uploadsArgs(p), '-C', work, SQL_MEMBER],
      TAR_WRITE,
    );
    const names = (await runClient('tar', ['--list', `--file=${partial}`], { stdout: 'pipe' })).split('\n');
    if (!names.includes(SQL_MEMBER)) throw new Error(`tar did not add ${SQL_MEMBER} to the archive`);
    renameSync(partial, file);
    return { file, photos: new Set(names.filter((n) => n.startsWith(`${UPLOADS_MEMBER}/`) && !n.endsWith('/'))).size };
  } catch (e) {
    rmSync(partial, { force: true });
    throw e;
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

/** Why an unpacked archive is not a backup made by `dump` (null when it is): only our two members, plain files. */
function unexpectedContent(dir) {
  const top = readdirSync(dir).sort();
  if (top.join(',') !== [SQL_MEMBER, UPLOADS_MEMBER].sort().join(','))
    return `it holds ${top.join(', ') || 'nothing'} instead of ${SQL_MEMBER} and ${UPLOADS_MEMBER}/`;
  if (!lstatSync(join(dir, SQL_MEMBER)).isFile() || !lstatSync(join(dir, UPLOADS_MEMBER)).isDirectory())
    return `${SQL_MEMBER} or ${UPLOADS_MEMBER}/ is of the wrong kind`;
  const others = entriesUnder(join(dir, UPLOADS_MEMBER)).filter((e) => !e.file && !e.folder);
  if (others.length) return `${join(UPLOADS_MEMBER, others[0].path)} is neither a file nor a folder`;
  if (!isCompleteDump(join(dir, SQL_MEMBER))) return `its ${SQL_MEMBER} is not a complete mariadb-dump file`;
  return null;
}

/** Load a checked SQL dump into the profile's database (every table in it is replaced). */
async function loadSql(p, sqlFile) {
  await startMariadb(p);
  await ensureDatabase(p);
  const input = openSync(sqlFile, 'r');
  try {
    await runClient(
      'mariadb',
      ['--no-defaults', `--socket=${mariadbSocket(p)}`, '-uroot', '--default-character-set=utf8mb4', p.dbName],
      { stdin: input },
    );
  } finally {
    closeSync(input);
  }
}

/**
 * Restore `file` (an archive made by `dump`, or a plain SQL dump of the database alone) into the profile. The
 * archive is unpacked beside the uploads folder and checked in full first: a wrong or cut-off file changes nothing.
 * Returns how many photo files were put back (null for a plain SQL dump, which leaves the photo files alone).
 */
export async function restore(p, file) {
  if (!file) throw new Error('name the backup file to restore');
  if (!existsSync(file)) throw new Error(`no such file: ${file}`);
  if (!isTar(file)) {
    if (!isCompleteDump(file))
      throw new Error(`${file} is neither a backup archive nor a complete mariadb-dump file; nothing was restored`);
    await loadSql(p, file);
    return { photos: null };
  }
  mkdirSync(dirname(p.uploadDir), { recursive: true });
  const staging = mkdtempSync(join(dirname(p.uploadDir), '.restore-'));
  try {
    try {
      await runClient('tar', ['--extract', `--file=${file}`, '--no-same-owner', '-C', staging]);
    } catch (e) {
      throw new Error(`${file} cannot be unpacked (${e.message}); nothing was restored`);
    }
    const problem = unexpectedContent(staging);
    if (problem) throw new Error(`${file} is not a Shoalbook backup: ${problem}; nothing was restored`);
    await loadSql(p, join(staging, SQL_MEMBER));
    // The restored rows name exactly the photo files of the archive: swap the whole folder, so photos added
    // after the backup go with the rows that named them.
    const incoming = join(staging, UPLOADS_MEMBER);
    if (existsSync(p.uploadDir)) renameSync(p.uploadDir, join(staging, `${basename(p.uploadDir)}.replaced`));
    renameSync(incoming, p.uploadDir);
    return { photos: entriesUnder(p.uploadDir).filter((e) => e.file).length };
  } finally {
    rmSync(staging, { recursive: true, force: true });
  }
}

const isMain = process.argv[1] && resolve(process.argv[1]) === resolve(new URL(import.meta.url).pathname);
if (isMain) {
  const [cmd, name = 'demo', file] = process.argv.slice(2);
  try {
    const p = profile(name);
    if (cmd === 'dump') {
      const written = await dump(p, file ? resolve(file) : undefined);
      log(
        `backed up ${p.dbName} (${p.name}) and ${written.photos} photo file(s) from ${p.uploadDir} to ${written.file}`,
      );
    } else if (cmd === 'restore') {
      const restored = await restore(p, file && resolve(file));
      log(
        restored.photos === null
          ? `restored ${p.dbName} (${p.name}) from the database-only dump ${file}; photo files in ${p.uploadDir} were left as they are`
          : `restored ${p.dbName} (${p.name}) and ${restored.photos} photo file(s) into ${p.uploadDir} from ${file}`,
      );
    } else {
      fail('usage: node scripts/backup.mjs dump|restore [demo|test|bench] [file]');
    }
  } catch (e) {
    fail(e.message);
  }
}
