import { randomUUID } from 'node:crypto';
import { createReadStream, type ReadStream } from 'node:fs';
import { mkdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, resolve, sep } from 'node:path';

/** Where attachment bytes live. Callers name files by key (`<kitchen>/<id>`), never by path. */
export interface FileStorage {
  /** Stores the bytes under the key, replacing nothing half-written: a reader sees the whole file or none. */
  put(key: string, bytes: Buffer): Promise<void>;
  /** A stream of the bytes, or undefined when the key holds nothing. */
  get(key: string): Promise<{ stream: ReadStream; bytes: number } | undefined>;
  /** Removes the key; removing a key that holds nothing is not an error. */
  delete(key: string): Promise<void>;
}

export const FILE_STORAGE = Symbol('FILE_STORAGE');

/** Segments of letters, digits, dot, dash and underscore, not starting with a dot: no `..`, no absolute path. */
const KEY = /^[A-Za-z0-9_-][A-Za-z0-9._-]{0,127}(\/[A-Za-z0-9_-][A-Za-z0-9._-]{0,127}){0,3}$/;

export class InvalidStorageKeyError extends Error {}

/** Files in a folder on the server's disk (STORAGE_DIR). */
export class DiskStorage implements FileStorage {
  private readonly root: string;

  constructor(root: string) {
    this.root = resolve(root);
  }

  /** The absolute path of a key, refusing anything that could leave the root (checked twice: by shape and by path). */
  pathOf(key: string): string {
    if (!KEY.test(key)) throw new InvalidStorageKeyError(`Not a storage key: ${JSON.stringify(key)}`);
    const path = resolve(this.root, key);
    if (!path.startsWith(this.root + sep)) throw new InvalidStorageKeyError(`Key leaves the storage: ${key}`);
    return path;
  }

  async put(key: string, bytes: Buffer): Promise<void> {
    const path = this.pathOf(key);
    await mkdir(dirname(path), { recursive: true });
    // Write beside, then rename: a crash mid-write leaves a temporary file, never a truncated attachment.
    const temp = `${path}.${randomUUID()}.part`;
    try {
      await writeFile(temp, bytes, { flag: 'wx' });
      await rename(temp, path);
    } catch (error) {
      await rm(temp, { force: true });
      throw error;
    }
  }

  async get(key: string): Promise<{ stream: ReadStream; bytes: number } | undefined> {
    const path = this.pathOf(key);
    try {
      const info = await stat(path);
      if (!info.isFile()) return undefined;
      return { stream: createReadStream(path), bytes: info.size };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }
}
