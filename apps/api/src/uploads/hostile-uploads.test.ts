import { createHash } from 'node:crypto';
import { readdir } from 'node:fs/promises';
import { parse } from 'content-disposition';
import { PDFDocument, PDFName, PDFString } from 'pdf-lib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  TINY_PDF,
  makeComponent,
  makeWorld,
  signIn,
  snapshot,
  type Session,
  type World,
} from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';

// PNG signature: ISO/IEC 15948 §5.2. Active PDF content: ISO 32000-1 §12.6.
const PNG_1x1 = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);
const HTML = Buffer.from('<!doctype html><script>alert(document.cookie)</script>\n');
const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');
let salt = 0;
/** A PDF with unique bytes, so no earlier upload's blob hides a write. */
const uniquePdf = () => Buffer.concat([TINY_PDF, Buffer.from(`%${(salt += 1)}\n`)]);

async function files(folder: string): Promise<string[]> {
  try {
    return (await readdir(folder, { recursive: true, withFileTypes: true }))
      .filter((e) => e.isFile())
      .map((e) => e.name)
      .sort();
  } catch {
    return [];
  }
}

describe('hostile uploads: each a clear 4xx and nothing stored; hostile names made safe', () => {
  let t: TestApp;
  let w: World;
  let designer: Session;

  beforeAll(async () => {
    t = await startTestApp({ HOOPLINE_UPLOAD_MAX_BYTES: String(64 * 1024) });
    w = await makeWorld(t);
    designer = await signIn(t, w.designer);
  });
  afterAll(async () => {
    await t.close();
  });

  async function activePdf(action: Record<string, unknown>): Promise<Buffer> {
    const doc = await PDFDocument.create();
    doc.addPage([100, 100]);
    doc.catalog.set(PDFName.of('OpenAction'), doc.context.obj(action as never));
    return Buffer.from(await doc.save());
  }

  const refusals: [string, () => Promise<Buffer>, string, number, string, RegExp][] = [
    [
      'HTML behind a .pdf name',
      async () => HTML,
      'drawing.pdf',
      415,
      'unsupported_file_type',
      /not a recognised file type/,
    ],
    ['zero bytes', async () => Buffer.alloc(0), 'empty.pdf', 400, 'validation_failed', /is empty/],
    [
      'over the limit',
      async () => Buffer.concat([TINY_PDF, Buffer.alloc(65 * 1024, 0x20)]),
      'big.pdf',
      413,
      'file_too_large',
      /larger than/,
    ],
    ['a traversal name', async () => uniquePdf(), '../../x.pdf', 400, 'validation_failed', /path/],
    [
      'a percent-escaped traversal name',
      async () => uniquePdf(),
      '%2e%2e%2fx.pdf',
      400,
      'validation_failed',
      /path|"\.\."/,
    ],
    [
      'a backslash path',
      async () => uniquePdf(),
      'C:\\Windows\\x.pdf',
      400,
      'validation_failed',
      /path/,
    ],
    [
      'a control character (CR LF) in the name',
      async () => uniquePdf(),
      'x\r\nSet-Cookie: a=b.pdf',
      400,
      'validation_failed',
      /control/,
    ],
    [
      'a right-to-left override in the name',
      async () => uniquePdf(),
      'invoice\u202efdp.exe',
      400,
      'validation_failed',
      /control/,
    ],
    [
      'a PDF running JavaScript on opening',
      () => activePdf({ S: 'JavaScript', JS: PDFString.of('app.alert(1)') }),
      'js.pdf',
      422,
      'pdf_active_content',
      /JavaScript/,
    ],
    [
      'a PDF launching a program on opening',
      () => activePdf({ S: 'Launch', F: PDFString.of('cmd.exe') }),
      'launch.pdf',
      422,
      'pdf_active_content',
      /Launch/,
    ],
  ];

  for (const [label, make, name, status, code, reason] of refusals) {
    it(`refuses ${label}: ${status} ${code}, no row, no blob`, async () => {
      const c = await makeComponent(t, w);
      const bytes = await make();
      const before = await snapshot(t);
      const blobsBefore = await files(t.uploadDir);
      const res = await designer.upload(
        `/api/components/${c.componentId}/attachments`,
        bytes,
        name,
      );
      expect(res.status).toBe(status);
      expect(res.body.error.code).toBe(code);
      expect(res.body.error.fields[0]).toMatchObject({ path: 'file', message: reason });
      expect(await snapshot(t)).toEqual(before);
      expect(await files(t.uploadDir)).toEqual(blobsBefore);
      if (bytes.length > 0) expect(await t.storage.has(sha256(bytes))).toBe(false);
    });
  }

  it('stores hostile-looking names safely, the extension following the sniffed type, and sends them back in an RFC 6266 header', async () => {
    const cases: [string, Buffer, string][] = [
      ['x.pdf.js', uniquePdf(), 'x.pdf.pdf'],
      ['door.pdf', PNG_1x1, 'door.png'],
      ['weld "map"; filename=evil.exe.pdf', uniquePdf(), 'weld _map_; filename=evil.exe.pdf'],
      ['CON.pdf', uniquePdf(), '_.pdf'],
      ['Prüfbericht σ 3 ✓.pdf', uniquePdf(), 'Prüfbericht σ 3 ✓.pdf'],
      ['100% final.pdf', uniquePdf(), '100_ final.pdf'],
    ];
    for (const [given, bytes, stored] of cases) {
      const c = await makeComponent(t, w);
      const res = await designer.upload(
        `/api/components/${c.componentId}/attachments`,
        bytes,
        given,
      );
      expect(res.status, given).toBe(201);
      expect(res.body.name).toBe(stored);
      const got = await designer.download(`/api/attachments/${res.body.id}/content`);
      const header = got.headers['content-disposition'] as string;
      expect(header).not.toMatch(/[\r\n]/);
      const parsed = parse(header);
      expect(parsed.type).toBe('attachment');
      expect(parsed.parameters['filename']).toBe(stored);
      const [event] = await t.dataSource.query(
        `select summary from audit_events where entity_id = $1 and action = 'attachment.uploaded'`,
        [res.body.id],
      );
      expect(JSON.stringify(event.summary)).toContain(JSON.stringify(stored));
      if (stored !== given) expect(JSON.stringify(event.summary)).toContain(JSON.stringify(given));
    }
  });
});
