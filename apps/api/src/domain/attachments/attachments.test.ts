import { createHash } from 'node:crypto';
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { CreateBucketCommand, S3Client } from '@aws-sdk/client-s3';
import S3rver from 's3rver';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  TINY_PDF,
  anonymous,
  count,
  makeComponent,
  makeWorld,
  signIn,
  snapshot,
  type Session,
  type World,
} from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';

// File signatures: PNG (ISO/IEC 15948 §5.2), JPEG/JFIF (ITU-T T.81 SOI + APP0),
// DXF (AutoCAD DXF reference, ASCII form), PE executables ("MZ" … "PE\0\0").
const PNG_1x1 = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);
const JPEG = Buffer.concat([
  Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]),
  Buffer.from('JFIF\0', 'latin1'),
  Buffer.alloc(64),
]);
const DXF = Buffer.from('  0\nSECTION\n  2\nENTITIES\n  0\nENDSEC\n  0\nEOF\n');
const EXE = Buffer.concat([
  Buffer.from('MZ', 'latin1'),
  Buffer.alloc(58),
  Buffer.from([0x80, 0, 0, 0]),
  Buffer.alloc(64),
  Buffer.from('PE\0\0', 'latin1'),
  Buffer.alloc(64),
]);

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

async function filesUnder(folder: string): Promise<string[]> {
  try {
    return (await readdir(folder, { recursive: true, withFileTypes: true }))
      .filter((e) => e.isFile())
      .map((e) => e.name);
  } catch {
    return [];
  }
}

describe('attachments (local disk storage)', () => {
  let t: TestApp;
  let w: World;
  let designer: Session;
  let fabricator: Session;

  beforeAll(async () => {
    t = await startTestApp({ HOOPLINE_UPLOAD_MAX_BYTES: String(64 * 1024) });
    w = await makeWorld(t);
    [designer, fabricator] = await Promise.all([signIn(t, w.designer), signIn(t, w.fabricator)]);
  });
  afterAll(async () => {
    await t.close();
  });

  it('requires sign-in', async () => {
    const c = await makeComponent(t, w);
    await anonymous(t).get(`/api/components/${c.componentId}/attachments`).expect(401);
    await anonymous(t).post(`/api/components/${c.componentId}/attachments`).expect(401);
  });

  it.each([
    ['a PDF drawing', 'door drawing rev B.pdf', TINY_PDF, 'application/pdf'],
    ['a PNG photo', 'weld photo.png', PNG_1x1, 'image/png'],
    ['a JPEG photo', 'nameplate.jpg', JPEG, 'image/jpeg'],
    ['a DXF drawing', 'flange.dxf', DXF, 'image/vnd.dxf'],
  ])('stores %s by its SHA-256 and gives it back', async (_label, name, bytes, type) => {
    const c = await makeComponent(t, w);
    const res = await designer.upload(`/api/components/${c.componentId}/attachments`, bytes, name);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      name,
      sha256: sha256(bytes),
      size: bytes.length,
      contentType: type,
    });
    expect(await t.storage.has(sha256(bytes))).toBe(true);
    const list = await designer.get(`/api/components/${c.componentId}/attachments`).expect(200);
    expect(list.body.items.map((a: { name: string }) => a.name)).toEqual([name]);
    const got = await designer.download(`/api/attachments/${res.body.id}/content`);
    expect(got.status).toBe(200);
    expect((got.body as Buffer).equals(bytes)).toBe(true);
    expect(got.headers['content-type']).toBe(type);
    expect(got.headers['x-content-type-options']).toBe('nosniff');
    expect(got.headers['content-disposition']).toMatch(/^attachment; filename=/);
  });

  it('serves images inline for thumbnails, and everything else as a download', async () => {
    const c = await makeComponent(t, w);
    const png = await t.services.attachments.upload(w.designer, c.componentId, {
      originalName: 'p.png',
      bytes: PNG_1x1,
    });
    const pdf = await t.services.attachments.upload(w.designer, c.componentId, {
      originalName: 'd.pdf',
      bytes: TINY_PDF,
    });
    const inline = await designer.download(`/api/attachments/${png.id}/content?disposition=inline`);
    expect(inline.headers['content-disposition']).toMatch(/^inline;/);
    const forced = await designer.download(`/api/attachments/${pdf.id}/content?disposition=inline`);
    expect(forced.headers['content-disposition']).toMatch(/^attachment;/);
  });

  it('stores the same content once, however many times it is attached', async () => {
    const bytes = Buffer.concat([TINY_PDF, Buffer.from('same bytes')]);
    const a = await makeComponent(t, w);
    const b = await makeComponent(t, w);
    await designer
      .upload(`/api/components/${a.componentId}/attachments`, bytes, 'one.pdf')
      .expect(201);
    await designer
      .upload(`/api/components/${b.componentId}/attachments`, bytes, 'two.pdf')
      .expect(201);
    const stored = (await filesUnder(t.uploadDir)).filter((f) => f === sha256(bytes));
    expect(stored).toHaveLength(1);
  });

  describe('refusals change nothing: no row, no stored file', () => {
    async function refused(name: string, bytes: Buffer, status: number, reason: RegExp) {
      const c = await makeComponent(t, w);
      const before = await snapshot(t);
      const filesBefore = await filesUnder(t.uploadDir);
      const res = await designer.upload(
        `/api/components/${c.componentId}/attachments`,
        bytes,
        name,
      );
      expect(res.status).toBe(status);
      expect(res.body.error.fields[0].path).toBe('file');
      expect(res.body.error.message).toMatch(reason);
      expect(await snapshot(t)).toEqual(before);
      expect(await filesUnder(t.uploadDir)).toEqual(filesBefore);
      expect(await t.storage.has(sha256(bytes))).toBe(false);
    }

    it('a renamed executable (a .pdf name on a Windows program)', async () => {
      await refused('specification.pdf', EXE, 415, /only PDF, PNG, JPEG and DXF/);
    });

    it('an over-size file (limit 64 KiB in this test)', async () => {
      const big = Buffer.concat([TINY_PDF, Buffer.alloc(65 * 1024, 0x20)]);
      await refused('huge.pdf', big, 413, /larger than/);
    });

    it('a path-traversal name', async () => {
      await refused(
        '../../../etc/passwd.pdf',
        Buffer.concat([TINY_PDF, Buffer.from('x')]),
        400,
        /must not contain a path/,
      );
    });

    it('a name with ".." in it', async () => {
      await refused('..pdf', Buffer.concat([TINY_PDF, Buffer.from('y')]), 400, /"\.\."/);
    });

    it('no file at all', async () => {
      const c = await makeComponent(t, w);
      const res = await designer.post(`/api/components/${c.componentId}/attachments`, {
        file: 'nope',
      });
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toEqual([
        { path: 'file', message: 'send the file as multipart/form-data' },
      ]);
    });
  });

  it('lets only designers upload; fabricators see attachments of issued components only', async () => {
    const draft = await makeComponent(t, w);
    const checker = await signIn(t, w.checker);
    const res = await checker.upload(
      `/api/components/${draft.componentId}/attachments`,
      TINY_PDF,
      'c.pdf',
    );
    expect(res.status).toBe(403);
    expect(await count(t, 'attachments')).toBeGreaterThan(0);
    await fabricator.get(`/api/components/${draft.componentId}/attachments`).expect(404);
    const issued = await makeComponent(t, w, 'countersigned');
    const a = await t.services.attachments.upload(w.designer, issued.componentId, {
      originalName: 'cert.pdf',
      bytes: TINY_PDF,
    });
    const list = await fabricator
      .get(`/api/components/${issued.componentId}/attachments`)
      .expect(200);
    expect(list.body.items.map((x: { id: string }) => x.id)).toEqual([a.id]);
  });

  it('removes an attachment (designers), audited', async () => {
    const c = await makeComponent(t, w);
    const a = await t.services.attachments.upload(w.designer, c.componentId, {
      originalName: 'old.pdf',
      bytes: TINY_PDF,
    });
    await designer.delete(`/api/attachments/${a.id}`).expect(204);
    await designer.get(`/api/attachments/${a.id}/content`).expect(404);
    const [event] = await t.dataSource.query(
      `select action from audit_events where entity_id = $1 and action = 'attachment.removed'`,
      [a.id],
    );
    expect(event).toBeDefined();
  });
});

describe('attachments on an S3-compatible bucket (local fake S3 server, s3rver)', () => {
  let server: S3rver;
  let t: TestApp;
  let w: World;
  let folder = '';

  beforeAll(async () => {
    folder = await mkdtemp(path.join(os.tmpdir(), 'hoopline-s3-api-'));
    server = new S3rver({ port: 0, address: '127.0.0.1', silent: true, directory: folder });
    const { port } = await server.run();
    const endpoint = `http://127.0.0.1:${port}`;
    const client = new S3Client({
      region: 'us-east-1',
      endpoint,
      forcePathStyle: true,
      credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    });
    await client.send(new CreateBucketCommand({ Bucket: 'hoopline-uploads' }));
    client.destroy();
    t = await startTestApp({
      HOOPLINE_STORAGE: 's3',
      HOOPLINE_S3_ENDPOINT: endpoint,
      HOOPLINE_S3_BUCKET: 'hoopline-uploads',
      HOOPLINE_S3_PREFIX: 'attachments',
      HOOPLINE_S3_ACCESS_KEY_ID: 'S3RVER',
      HOOPLINE_S3_SECRET_ACCESS_KEY: 'S3RVER',
    });
    w = await makeWorld(t);
  });
  afterAll(async () => {
    await t.close();
    await server.close();
    await rm(folder, { recursive: true, force: true });
  });

  it('stores an upload in the bucket and serves it back', async () => {
    const designer = await signIn(t, w.designer);
    const c = await makeComponent(t, w);
    const bytes = Buffer.concat([TINY_PDF, Buffer.from('in the bucket')]);
    const res = await designer.upload(
      `/api/components/${c.componentId}/attachments`,
      bytes,
      'bucket.pdf',
    );
    expect(res.status).toBe(201);
    expect(await t.storage.has(sha256(bytes))).toBe(true);
    expect(t.storage.description).toContain('S3 bucket hoopline-uploads');
    const got = await designer.download(`/api/attachments/${res.body.id}/content`);
    expect((got.body as Buffer).equals(bytes)).toBe(true);
  });
});
