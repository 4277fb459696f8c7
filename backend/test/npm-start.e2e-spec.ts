import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

const ROOT = resolve(__dirname, '..', '..');
// scripts/start.mjs on its own profile beside the test one (ports + 1000, its own data; see profile.mjs).
const START_PROFILE = `${process.env.SHOALBOOK_TEST_PROFILE || 'test'}-start`;

/** Resolves once `line` appears in the child's output; rejects if it exits first or the time runs out. */
function waitForLine(child: ChildProcess, line: string, timeoutMs: number): Promise<void> {
  return new Promise((ok, fail) => {
    let output = '';
    const timer = setTimeout(() => fail(new Error(`no "${line}" in ${timeoutMs} ms:\n${output}`)), timeoutMs);
    const seen = (chunk: Buffer) => {
      output += chunk.toString();
      if (!output.includes(line)) return;
      clearTimeout(timer);
      ok();
    };
    child.stdout!.on('data', seen);
    child.stderr!.on('data', seen);
    child.once(
      'exit',
      (code) => (clearTimeout(timer), fail(new Error(`exited (${code}) before "${line}":\n${output}`))),
    );
  });
}

const alive = (pid: number) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

const childPids = (parent: number) =>
  readFileSync(`/proc/${parent}/task/${parent}/children`, 'utf8').trim().split(/\s+/).filter(Boolean).map(Number);

/** The pid of the child of `parent` whose command line holds `script`. */
function childRunning(parent: number, script: string): number {
  const pid = childPids(parent).find((c) => readFileSync(`/proc/${c}/cmdline`, 'utf8').includes(script));
  if (!pid) throw new Error(`no child of ${parent} runs ${script}`);
  return pid;
}

describe('npm start when its server dies', () => {
  let start: ChildProcess | undefined;
  let stopDatabase = async () => {};
  // On a failure, leave nothing running: the start script, its fake SMTP and its MariaDB.
  afterAll(async () => {
    if (start && start.exitCode === null && start.signalCode === null) {
      for (const c of childPids(start.pid!)) process.kill(c, 'SIGKILL');
      start.kill('SIGKILL');
    }
    await stopDatabase();
  });

  it('stops with a non-zero code and stops the MariaDB it started', { timeout: 300_000 }, async () => {
    const { profile } = await import('../../scripts/lib/profile.mjs');
    const { ourPid, stopMariadb } = (await import('../../scripts/lib/mariadb.mjs')) as {
      ourPid: (p: unknown) => number | null;
      stopMariadb: (p: unknown) => Promise<boolean>;
    };
    const p = profile(START_PROFILE);
    stopDatabase = () => stopMariadb(p).then(() => undefined);
    expect(ourPid(p), 'the start profile has no MariaDB running before the test').toBeNull();

    start = spawn(process.execPath, [join(ROOT, 'scripts', 'start.mjs')], {
      cwd: ROOT,
      env: { ...process.env, SHOALBOOK_START_PROFILE: START_PROFILE },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    // The first run on a fresh profile installs MariaDB's data folder and seeds the demo: give it minutes.
    await waitForLine(start, 'Shoalbook is running on', 240_000);
    const dbPid = ourPid(p);
    expect(dbPid, 'npm start runs its own MariaDB').not.toBeNull();
    const health = await fetch(`http://127.0.0.1:${p.port}/api/health`);
    expect(health.status).toBe(200);

    const serverPid = childRunning(start.pid!, join('backend', 'dist', 'main.js'));
    const exited = new Promise<{ code: number | null }>((r) => start!.once('exit', (code) => r({ code })));
    process.kill(serverPid, 'SIGKILL');

    const stillRunning = new Promise<{ code: string }>((r) => setTimeout(() => r({ code: 'still running' }), 60_000));
    const { code } = await Promise.race([exited, stillRunning]);
    expect(code).toBe(1);
    expect(alive(dbPid!), 'the MariaDB npm start started is stopped with it').toBe(false);
    await expect(fetch(`http://127.0.0.1:${p.port}/api/health`)).rejects.toThrow();
  });
});
