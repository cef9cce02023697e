/**
 * Write a file so that no reader ever sees half of it: write beside it under
 * a temporary name, then rename (atomic on one file system). An interrupted
 * run leaves at most a stray `.tmp` file, never a truncated chart.
 */
import { randomBytes } from 'node:crypto';
import { mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';

export async function writeFileAtomic(path: string, data: string | Uint8Array): Promise<void> {
  const temp = `${path}.${process.pid}-${randomBytes(4).toString('hex')}.tmp`;
  try {
    // The folder is made only when it is missing: in a batch, nearly every file goes to a folder that exists.
    await writeFile(temp, data).catch(async (error: NodeJS.ErrnoException) => {
      if (error.code !== 'ENOENT') throw error;
      await mkdir(dirname(path), { recursive: true });
      await writeFile(temp, data);
    });
    await rename(temp, path);
  } catch (error) {
    await rm(temp, { force: true });
    throw error;
  }
}
