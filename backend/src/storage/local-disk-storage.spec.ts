import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { LocalDiskStorage } from './local-disk-storage';

describe('LocalDiskStorage', () => {
  let dir: string;
  beforeEach(async () => {
    dir = await mkdtemp(join(tmpdir(), 'sb-storage-'));
  });
  afterEach(async () => rm(dir, { recursive: true, force: true }));

  it('stores under random keys and reads back', async () => {
    const s = new LocalDiskStorage(dir);
    const a = await s.put(Buffer.from('one'));
    const b = await s.put(Buffer.from('one'));
    expect(a).not.toBe(b);
    expect((await s.get(a))!.toString()).toBe('one');
    await s.delete(a);
    expect(await s.get(a)).toBeNull();
    expect(await readdir(join(dir, b.slice(0, 2)))).toContain(b.slice(3));
  });

  it('refuses keys it did not make (no path traversal)', async () => {
    const s = new LocalDiskStorage(dir);
    await expect(s.get('../../etc/passwd')).rejects.toThrow('invalid storage key');
  });
});
