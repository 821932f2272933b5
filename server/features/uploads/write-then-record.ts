import type { FileStorage } from '../../adapters/storage/file-storage';

export interface PendingFile {
  key: string;
  data: Buffer;
}

/**
 * Writes every file, then runs `record` (the database rows, in one transaction). If any write or the
 * transaction fails, the files written for this request are removed again, so a failure leaves neither
 * rows pointing at missing files nor files no row points at. The caller's own copy is untouched.
 */
export async function writeThenRecord<T>(storage: FileStorage, files: PendingFile[], record: () => Promise<T>): Promise<T> {
  const attempted: string[] = [];
  try {
    for (const file of files) {
      attempted.push(file.key);
      await storage.put(file.key, file.data);
    }
    return await record();
  } catch (error) {
    await Promise.allSettled(attempted.map((key) => storage.remove(key)));
    throw error;
  }
}
