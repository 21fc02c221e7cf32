/**
 * pnpm --filter @hoopline/api bench: how long a stamped sheet takes to render.
 *
 * A typical revision (the demo door plate: two load cases, full trail) against
 * a minimal one-page document with the same fonts, in the same run, so the
 * ratio holds whatever the machine is doing. Aim: median under 500 ms and
 * under 5× the minimal document.
 */
import { Document, Page, Text, renderToBuffer } from '@react-pdf/renderer';
import { METHODS, screen } from '@hoopline/calc';
import { PDFDocument } from 'pdf-lib';
import { Bench } from 'tinybench';
import { FONT_FAMILY, registerSheetFonts } from '../src/sheets/fonts';
import { renderSheet } from '../src/sheets/render-sheet';
import type { SheetData } from '../src/sheets/sheet-data';

const plate = METHODS.find((m) => m.kind === 'rectangular-plate');
if (!plate) throw new Error('the rectangular-plate method is missing');
const inputs = {
  ...(plate.examples[0]!.input as Record<string, unknown>),
  loadCases: [
    { name: 'Operating: full vacuum', internal: 'full vacuum' },
    { name: 'Vent back-fill', internal: '0.2 bar(g)' },
  ],
};
const report = screen(inputs);
const typical: SheetData = {
  project: {
    number: 'LAM-2026-014',
    name: 'Vacuum drying cabinet VDC-3',
    client: 'Larchmont Applied Materials',
    unitSystem: 'si',
  },
  component: { name: 'Cabinet door', kind: report.kind, tag: 'VDC-3-D1' },
  revision: {
    number: 3,
    status: 'countersigned',
    contentHash: 'c0ffee'.padEnd(64, '0'),
    verifyCode: 'c0ff-ee00-0000',
    engineVersion: report.engine.version,
    createdAt: '2026-12-01T09:00:00.000Z',
    submittedAt: '2026-12-01T10:00:00.000Z',
    note: 'door thickened after the vent case',
    inputs,
    report,
  },
  author: { name: 'Dana Okafor' },
  countersign: {
    checker: 'Ravi Lindqvist',
    at: '2026-12-02T08:30:00.000Z',
    comment: 'checked',
    hashSigned: 'c0ffee'.padEnd(64, '0'),
  },
  attachments: [{ name: 'door drawing rev C.pdf', sha256: 'ab'.repeat(32), size: 183_210 }],
  verifyUrl: 'http://127.0.0.1:8080/verify/c0ff-ee00-0000',
  stamp: 'review',
  paperSize: 'A4',
  generatedAt: '2026-12-02T09:00:00.000Z',
};

registerSheetFonts();
const minimal = (
  <Document>
    <Page size="A4" style={{ fontFamily: FONT_FAMILY, padding: 40 }}>
      <Text>Hoopline</Text>
    </Page>
  </Document>
);

const pages = (await PDFDocument.load(await renderSheet(typical))).getPageCount();
const bench = new Bench({ iterations: 15, warmupIterations: 3, time: 0 });
bench
  .add('typical sheet (rectangular plate, 2 load cases)', async () => {
    await renderSheet(typical);
  })
  .add('minimal one-page document, same fonts', async () => {
    await renderToBuffer(minimal);
  });
await bench.run();

const median = (name: string) => {
  const task = bench.tasks.find((t) => t.name === name);
  const result = task?.result as { latency?: { p50?: number } } | undefined;
  const p50 = result?.latency?.p50;
  if (p50 === undefined) throw new Error(`no result for ${name}`);
  return p50;
};
const sheet = median('typical sheet (rectangular plate, 2 load cases)');
const small = median('minimal one-page document, same fonts');
console.table(
  bench.tasks.map((t) => {
    const r = t.result as { latency?: { p50?: number; mean?: number } } | undefined;
    return {
      task: t.name,
      'median ms': r?.latency?.p50?.toFixed(1),
      'mean ms': r?.latency?.mean?.toFixed(1),
    };
  }),
);
console.log(
  `sheet render: median ${sheet.toFixed(0)} ms for ${pages} pages; minimal document ${small.toFixed(1)} ms; ratio ${(sheet / small).toFixed(1)}× (aim: < 500 ms and < 5×)`,
);
