import {
  mkdir,
  readFile,
  readdir,
  rename,
  stat,
  unlink,
  utimes,
  writeFile,
} from 'node:fs/promises';
import { randomBytes } from 'node:crypto';
import os from 'node:os';
import path from 'node:path';
import { keyFor, type BlobStorage, type StoredBlob } from './storage';

const HASH_FILE = /^[0-9a-f]{64}$/;
/** <hash>.<host>.<pid>.<random>.part: who was writing it, so a restart can tell a dead writer's. */
const PART_FILE = /^[0-9a-f]{64}\.(.+)\.(\d+)\.[0-9a-f]+\.part$/;
const HOST = os.hostname().replace(/[^A-Za-z0-9-]/g, '_');

function writerIsGone(host: string, pid: number): boolean {
  if (host !== HOST) return false; // another machine's process: only age tells
  if (pid === process.pid) return false;
  try {
    process.kill(pid, 0);
    return false;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'ESRCH';
  }
}

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
    if (await this.has(sha256)) {
      // Fresh again: the sweep leaves a blob alone for its grace period after
      // its last put, so a blob it found unreferenced is not taken from under
      // an upload that is about to reference it.
      const now = new Date();
      await utimes(target, now, now).catch(() => undefined);
      return;
    }
    await mkdir(path.dirname(target), { recursive: true });
    // Write beside, then rename: a reader never sees half a file. A process
    // killed in between leaves the .part, which sweepPartials removes.
    const temporary = `${target}.${HOST}.${process.pid}.${randomBytes(6).toString('hex')}.part`;
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

  private async entries(): Promise<{ name: string; file: string; modifiedAt: Date }[]> {
    let names: string[];
    try {
      names = (await readdir(this.root, { recursive: true })).map(String);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return [];
      throw error;
    }
    const out: { name: string; file: string; modifiedAt: Date }[] = [];
    for (const relative of names) {
      const file = path.join(this.root, relative);
      const info = await stat(file).catch(() => null);
      if (info?.isFile()) out.push({ name: path.basename(relative), file, modifiedAt: info.mtime });
    }
    return out;
  }

  /**
   * Removes half-written files: those whose writer (a process on this
   * machine) is gone, at once; any other older than `olderThanMs`.
   */
  async sweepPartials(olderThanMs: number): Promise<number> {
    let removed = 0;
    for (const entry of await this.entries()) {
      const part = PART_FILE.exec(entry.name);
      if (!entry.name.endsWith('.part')) continue;
      const stale = Date.now() - entry.modifiedAt.getTime() >= olderThanMs;
      if (stale || (part && writerIsGone(part[1]!, Number(part[2])))) {
        await unlink(entry.file).catch(() => undefined);
        removed += 1;
      }
    }
    return removed;
  }

  async listBlobs(): Promise<StoredBlob[]> {
    return (await this.entries())
      .filter((e) => HASH_FILE.test(e.name))
      .map((e) => ({ sha256: e.name, modifiedAt: e.modifiedAt }));
  }

  async delete(sha256: string, unchangedSince: Date): Promise<boolean> {
    const file = this.file(sha256);
    const info = await stat(file).catch(() => null);
    // Put again since it was listed: in use after all.
    if (!info || info.mtime.getTime() > unchangedSince.getTime()) return false;
    await unlink(file).catch(() => undefined);
    return true;
  }
}
