import { mkdir, readFile, rename, stat, writeFile } from 'node:fs/promises';
import { randomBytes } from 'node:crypto';
import path from 'node:path';
import { keyFor, type BlobStorage } from './storage';

/** Files on local disk under one root folder (the default: .data/uploads). */
export class LocalDiskStorage implements BlobStorage {
  readonly description: string;
  constructor(private readonly root: string) {
    this.description = `local disk at ${root}`;
  }

  private file(sha256: string): string {
    return path.join(this.root, keyFor(sha256));
  }

  async put(sha256: string, bytes: Buffer, _contentType?: string): Promise<void> {
    const target = this.file(sha256);
    if (await this.has(sha256)) return;
    await mkdir(path.dirname(target), { recursive: true });
    // Write beside, then rename: a reader never sees half a file.
    const temporary = `${target}.${randomBytes(6).toString('hex')}.part`;
    await writeFile(temporary, bytes, { flag: 'wx' });
    await rename(temporary, target);
  }

  async get(sha256: string): Promise<Buffer | null> {
    try {
      return await readFile(this.file(sha256));
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw error;
    }
  }

  async has(sha256: string): Promise<boolean> {
    try {
      return (await stat(this.file(sha256))).isFile();
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return false;
      throw error;
    }
  }
}
