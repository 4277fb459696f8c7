// Small process helpers shared by the start, test and bench commands.
import { spawn, spawnSync } from 'node:child_process';

export function log(msg) {
  process.stdout.write(`\x1b[36m[shoalbook]\x1b[0m ${msg}\n`);
}

export function fail(msg) {
  process.stderr.write(`\x1b[31m[shoalbook] ${msg}\x1b[0m\n`);
  process.exit(1);
}

/** Run a command to completion, inheriting output; throws on a non-zero exit. */
export function run(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', ...opts });
  if (r.error) throw r.error;
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')} exited with ${r.status}`);
  return r;
}

/** Run and capture output; never throws on a non-zero exit. */
export function capture(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { encoding: 'utf8', ...opts });
  return { status: r.status ?? -1, stdout: r.stdout ?? '', stderr: r.stderr ?? '', error: r.error };
}

/** Start a long-running child; its output is prefixed so the console stays readable. */
export function startChild(name, cmd, args, opts = {}) {
  const child = spawn(cmd, args, { stdio: ['ignore', 'pipe', 'pipe'], ...opts });
  const prefix = (chunk) =>
    chunk
      .toString()
      .split('\n')
      .filter(Boolean)
      .map((l) => `[${name}] ${l}\n`)
      .join('');
  child.stdout?.on('data', (c) => process.stdout.write(prefix(c)));
  child.stderr?.on('data', (c) => process.stderr.write(prefix(c)));
  return child;
}

/** Still running: a child killed by a signal has no exit code, only its signal. */
export const isRunning = (child) => child.exitCode === null && child.signalCode === null;

/** SIGTERM, then SIGKILL after 10 s; resolves once the child has exited (at once if it is not running). */
export function stopChild(child) {
  if (!child || !isRunning(child)) return Promise.resolve();
  return new Promise((resolve) => {
    const stubborn = setTimeout(() => child.kill('SIGKILL'), 10_000);
    child.once('exit', () => {
      clearTimeout(stubborn);
      resolve();
    });
    child.kill('SIGTERM');
  });
}

export const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** Poll `check` until it returns truthy or the time runs out. */
export async function waitFor(check, { timeoutMs = 30000, intervalMs = 100, what = 'condition' } = {}) {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    if (await check()) return;
    await sleep(intervalMs);
  }
  throw new Error(`timed out waiting for ${what}`);
}
