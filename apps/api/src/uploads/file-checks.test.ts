import { describe, expect, it } from 'vitest';
import { checkFileName, displayName, sniffFileType } from './file-checks';

// Signatures: PDF 1.7 (ISO 32000-1 §7.5.2 header "%PDF-"), PNG (ISO/IEC 15948 §5.2
// signature), JPEG/JFIF (ITU-T T.81 SOI marker FF D8 + APP0 "JFIF"), DXF (AutoCAD
// DXF reference: ASCII group code 0 + SECTION; binary sentinel), PE executables ("MZ").
const PNG_1x1 = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);
const JPEG = Buffer.concat([
  Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]),
  Buffer.from('JFIF\0', 'latin1'),
  Buffer.alloc(64),
]);
const PDF = Buffer.from(
  '%PDF-1.7\n%âãÏÓ\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n<<>>\n%%EOF\n',
  'latin1',
);
const ASCII_DXF = Buffer.from(
  '999\nmade by hand\n  0\nSECTION\n  2\nHEADER\n  0\nENDSEC\n  0\nEOF\n',
);
const BINARY_DXF = Buffer.concat([
  Buffer.from('AutoCAD Binary DXF\r\n\x1a\x00', 'latin1'),
  Buffer.alloc(32),
]);
const WINDOWS_EXE = Buffer.concat([
  Buffer.from('MZ', 'latin1'),
  Buffer.alloc(58),
  Buffer.from([0x80, 0, 0, 0]),
  Buffer.alloc(64),
  Buffer.from('PE\0\0', 'latin1'),
  Buffer.alloc(64),
]);
const ELF = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1]), Buffer.alloc(64)]);

describe('sniffFileType (content, never the name)', () => {
  it.each([
    ['PDF', PDF, 'application/pdf'],
    ['PNG', PNG_1x1, 'image/png'],
    ['JPEG', JPEG, 'image/jpeg'],
    ['ASCII DXF', ASCII_DXF, 'image/vnd.dxf'],
    ['binary DXF', BINARY_DXF, 'image/vnd.dxf'],
  ])('accepts a %s file', async (_label, bytes, type) => {
    expect(await sniffFileType(bytes)).toEqual({ ok: true, type });
  });

  it.each([
    ['a Windows executable', WINDOWS_EXE, /only PDF, PNG, JPEG and DXF/],
    ['an ELF executable', ELF, /only PDF, PNG, JPEG and DXF/],
    ['plain text', Buffer.from('just some notes about the door\n'), /not a recognised file type/],
    ['an empty file', Buffer.alloc(0), /empty/],
  ])('refuses %s', async (_label, bytes, reason) => {
    const result = await sniffFileType(bytes);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.reason).toMatch(reason);
  });
});

describe('checkFileName', () => {
  it('keeps an ordinary name, tidied', () => {
    expect(checkFileName('  Door  drawing rev B.pdf ')).toEqual({
      ok: true,
      name: 'Door drawing rev B.pdf',
    });
    expect(checkFileName('weld map: "final".dxf')).toEqual({
      ok: true,
      name: 'weld map_ _final_.dxf',
    });
    expect(checkFileName('σ-check photo.jpg')).toEqual({ ok: true, name: 'σ-check photo.jpg' });
  });

  it.each([
    ['../../etc/passwd', /path/],
    ['..\\..\\boot.ini', /path/],
    ['drawings/door.pdf', /path/],
    ['door..pdf', /"\.\."/],
    ['..', /"\.\."/],
    ['.bashrc', /dot/],
    ['door\u0000.pdf', /control/],
    ['door\r\n.pdf', /control/],
    ['door\u0085.pdf', /control/],
    ['invoice\u202efdp.exe', /control/],
    ['a\u200bb.pdf', /control/],
    ['%2e%2e%2fx.pdf', /path|"\.\."/],
    ['%252e%252e%252fx.pdf', /path|"\.\."/],
    ['..%5cboot.pdf', /"\.\."/],
    ['x%00.pdf', /control/],
    ['', /needs a name/],
    ['x'.repeat(121), /120/],
  ])('refuses %j', (name, reason) => {
    const result = checkFileName(name);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.reason).toMatch(reason);
  });
});

describe('displayName: the stored name, its extension from the sniffed type', () => {
  it.each([
    ['x.pdf.js', 'application/pdf', 'x.pdf.pdf'],
    ['door.pdf', 'image/png', 'door.png'],
    ['photo.JPEG', 'image/jpeg', 'photo.JPEG'.slice(0, 5) + '.jpeg'],
    ['report', 'application/pdf', 'report.pdf'],
    ['report rev 1.2', 'application/pdf', 'report rev 1.2.pdf'],
    ['setup.exe', 'application/pdf', 'setup.pdf'],
    ['CON.pdf', 'application/pdf', '_.pdf'],
    ['weld map_ _final_.dxf', 'image/vnd.dxf', 'weld map_ _final_.dxf'],
    ['100%.pdf', 'application/pdf', '100_.pdf'],
    ['σ-check photo.jpg', 'image/jpeg', 'σ-check photo.jpg'],
  ] as const)('%j holding %s is stored as %j', (name, type, stored) => {
    expect(displayName(name, type)).toBe(stored);
  });
});
