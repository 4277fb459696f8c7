/**
 * Where uploaded bytes live. Keys are random and opaque: never derived from a file name, so a name can
 * never become a path. A cloud implementation can replace the local one behind this interface.
 */
export abstract class StorageService {
  /** Store bytes under a new random key and return the key. */
  abstract put(bytes: Buffer): Promise<string>;
  /** The bytes under `key`, or null when there are none. */
  abstract get(key: string): Promise<Buffer | null>;
  abstract delete(key: string): Promise<void>;
}
