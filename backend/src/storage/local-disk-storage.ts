import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { StorageService } from './storage.service';

const KEY = /^[0-9a-f]{2}\/[0-9a-f]{32}$/;

/** Local-disk storage under UPLOAD_DIR (a private folder, not served statically). */
export class LocalDiskStorage extends StorageService {
  constructor(private readonly root: string) {
    super();
  }

  async put(bytes: Buffer): Promise<string> {
    const name = randomBytes(16).toString('hex');
    const key = `${name.slice(0, 2)}/${name}`;
    await mkdir(join(this.root, name.slice(0, 2)), { recursive: true, mode: 0o700 });
    await writeFile(this.path(key), bytes, { mode: 0o600, flag: 'wx' });
    return key;
  }

  async get(key: string): Promise<Buffer | null> {
    try {
      return await readFile(this.path(key));
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw e;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.path(key), { force: true });
  }

  /** Only keys this class made map to a path; anything else is refused. */
  private path(key: string): string {
    if (!KEY.test(key)) throw new Error('invalid storage key');
    return join(this.root, key);
  }
}
