import { createReadStream } from 'node:fs';
import { mkdir, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, resolve, sep } from 'node:path';
import type { Readable } from 'node:stream';

/** Where uploaded bytes live. Keys look like `photos/12/800.webp`; the local folder is the default. */
export interface FileStorage {
  put(key: string, data: Buffer): Promise<void>;
  read(key: string): Promise<{ stream: Readable; size: number } | null>;
  remove(key: string): Promise<void>;
}

export function createLocalStorage(root: string): FileStorage {
  const base = resolve(root);
  const pathOf = (key: string) => {
    const full = resolve(base, key);
    if (!full.startsWith(base + sep)) throw new Error(`Storage key escapes the storage root: ${key}`);
    return full;
  };
  return {
    async put(key, data) {
      const full = pathOf(key);
      await mkdir(dirname(full), { recursive: true });
      await writeFile(full, data);
    },
    async read(key) {
      let full: string;
      try {
        full = pathOf(key);
        const info = await stat(full);
        if (!info.isFile()) return null;
        return { stream: createReadStream(full), size: info.size };
      } catch {
        return null;
      }
    },
    async remove(key) {
      await rm(pathOf(key), { force: true });
    },
  };
}
