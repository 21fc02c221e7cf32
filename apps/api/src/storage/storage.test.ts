import { createHash } from 'node:crypto';
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { CreateBucketCommand, S3Client } from '@aws-sdk/client-s3';
import S3rver from 's3rver';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LocalDiskStorage } from './local-disk-storage';
import { S3Storage } from './s3-storage';
import { keyFor, type BlobStorage } from './storage';

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

function contract(name: string, make: () => BlobStorage) {
  describe(`${name}: the storage contract`, () => {
    it('stores bytes under their hash and gives them back', async () => {
      const storage = make();
      const bytes = Buffer.from(`drawing ${name} ${Math.random()}`);
      const hash = sha256(bytes);
      expect(await storage.has(hash)).toBe(false);
      expect(await storage.get(hash)).toBeNull();
      await storage.put(hash, bytes, 'application/pdf');
      expect(await storage.has(hash)).toBe(true);
      expect((await storage.get(hash))?.equals(bytes)).toBe(true);
      await storage.put(hash, bytes, 'application/pdf'); // the same content twice is one object
      expect((await storage.get(hash))?.equals(bytes)).toBe(true);
    });

    it('refuses a key that is not a SHA-256 digest (no path can be named)', async () => {
      const storage = make();
      await expect(storage.get('../../etc/passwd')).rejects.toThrow(/SHA-256/);
      await expect(
        storage.put('ab'.repeat(31) + 'zz', Buffer.from('x'), 'text/plain'),
      ).rejects.toThrow(/SHA-256/);
    });
  });
}

describe('keyFor', () => {
  it('fans out by the first two bytes', () => {
    const hash = 'ab'.repeat(32);
    expect(keyFor(hash)).toBe(`ab/ab/${hash}`);
  });
});

let folder = '';
beforeAll(async () => {
  folder = await mkdtemp(path.join(os.tmpdir(), 'hoopline-storage-'));
});
afterAll(async () => {
  await rm(folder, { recursive: true, force: true });
});

contract('local disk', () => new LocalDiskStorage(folder));

describe('local disk layout', () => {
  it('leaves no partial files behind', async () => {
    const storage = new LocalDiskStorage(folder);
    const bytes = Buffer.from('complete file');
    await storage.put(sha256(bytes), bytes, 'application/pdf');
    const all = await readdir(folder, { recursive: true });
    expect(all.filter((f) => String(f).endsWith('.part'))).toEqual([]);
  });
});

describe('S3-compatible storage against a local fake S3 server (s3rver)', () => {
  let server: S3rver;
  let endpoint = '';
  const storages: S3Storage[] = [];
  beforeAll(async () => {
    const directory = await mkdtemp(path.join(os.tmpdir(), 'hoopline-s3-'));
    server = new S3rver({ port: 0, address: '127.0.0.1', silent: true, directory });
    const { port } = await server.run();
    endpoint = `http://127.0.0.1:${port}`;
    const client = new S3Client({
      region: 'us-east-1',
      endpoint,
      forcePathStyle: true,
      credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    });
    await client.send(new CreateBucketCommand({ Bucket: 'hoopline-test' }));
    client.destroy();
  });
  afterAll(async () => {
    for (const s of storages) s.destroy();
    await server.close();
  });
  const make = () => {
    const storage = new S3Storage({
      endpoint,
      region: 'us-east-1',
      bucket: 'hoopline-test',
      prefix: 'uploads',
      accessKeyId: 'S3RVER',
      secretAccessKey: 'S3RVER',
    });
    storages.push(storage);
    return storage;
  };
  contract('S3', make);
});
