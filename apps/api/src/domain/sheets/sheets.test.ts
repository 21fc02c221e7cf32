import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { PDFParse } from 'pdf-parse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  TINY_PDF,
  anonymous,
  makeWorld,
  signIn,
  type Session,
  type World,
} from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';

/**
 * One component of every kind, each built so that a published or computed
 * check value appears on its sheet. The sheet is fetched through the API and
 * its text extracted with pdf-parse.
 */
const CASES: ReadonlyArray<{
  kind: string;
  inputs: Record<string, unknown>;
  /** Text the sheet must show (trail values in SI to six figures, checks to four), and where the number comes from. */
  expected: string;
  source: string;
}> = [
  {
    kind: 'flat-area-load',
    inputs: {
      kind: 'flat-area-load',
      site: { ambientPressure: '101325 Pa' },
      outline: { shape: 'circle', sealDiameter: '500 mm' },
      fastenerCount: 12,
      loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    },
    expected: '19 895.1 N',
    source: 'force_per_fastener_door: F = Δp·A = 19 895 N (computed from F = Δp·A, METHODS §b)',
  },
  {
    kind: 'circular-plate',
    inputs: {
      kind: 'circular-plate',
      site: { ambientPressure: '101325 Pa' },
      diameter: '500 mm',
      thickness: '10 mm',
      edge: 'clamped',
      material: 'carbon-steel',
      loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    },
    expected: '47 496 100 Pa',
    source: 'circ_plate_clamped_steel_a0p25_t10mm: σ_max = 47.496 MPa (Roark Table 11.2 case 10b)',
  },
  {
    kind: 'rectangular-plate',
    inputs: {
      kind: 'rectangular-plate',
      site: { ambientPressure: '101325 Pa' },
      width: '600 mm',
      height: '400 mm',
      thickness: '12 mm',
      edge: 'clamped',
      material: 'carbon-steel',
      loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    },
    expected: '51.11 MPa',
    source:
      'clamped door 600 × 400 × 12 mm: σ_edge = 6·0.0757·q·b²/t² = 51.14 MPa (Timoshenko & Woinowsky-Krieger Table 35, b/a = 1.5, from memory); the engine’s series gives 51.108 MPa',
  },
  {
    kind: 'cylindrical-shell',
    inputs: {
      kind: 'cylindrical-shell',
      site: { ambientPressure: '101325 Pa' },
      diameter: '1005 mm',
      diameterBasis: 'outside',
      thickness: '5 mm',
      length: '20 m',
      material: 'carbon-steel',
      loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    },
    expected: '54 945.1 Pa',
    source:
      'bresse_steel_D1m_t5mm: p_cr = 2E/(1 − ν²)·(t/D)³ = 54 945 Pa (Roark Table 35 case 19a)',
  },
  {
    kind: 'sphere-or-head',
    inputs: {
      kind: 'sphere-or-head',
      site: { ambientPressure: '101325 Pa' },
      shape: 'sphere',
      diameter: '2 m',
      diameterBasis: 'outside',
      thickness: '10 mm',
      material: 'carbon-steel',
      loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    },
    expected: '24 209 100 Pa',
    source: 'zoelly_sphere_steel: p_cl = 1.2105·E·(t/R)² = 24.21 MPa (Huston & Josephs eq. 31.1)',
  },
  {
    kind: 'stored-energy',
    inputs: {
      kind: 'stored-energy',
      site: { ambientPressure: '101325 Pa' },
      volume: '50 L',
      gas: 'air',
      loadCases: [{ name: 'Receiver at 1.1 MPa(a)', internal: '1.1 MPa(a)' }],
    },
    expected: '124 834 J',
    source: 'brode_air_50L_10barg: E = (p1 − p0)·V/(γ − 1) = 124 834 J (Brode form, METHODS §h)',
  },
  {
    kind: 'pump-down',
    inputs: {
      kind: 'pump-down',
      site: { ambientPressure: '101325 Pa' },
      volume: '1 m3',
      pumpingSpeed: '10 L/s',
      targetPressure: '10 Pa(a)',
    },
    expected: '922.35 s',
    source: 'pumpdown_1m3_10Lps: t = (V/S)·ln(p0/p) = 922.35 s (O’Hanlon, from memory)',
  },
];

const ARTIFACTS = path.resolve(import.meta.dirname, '../../../test-results/sheets');

async function pdfText(bytes: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  try {
    return (await parser.getText()).text;
  } finally {
    await parser.destroy();
  }
}

describe('the stamped-for-review sheet (rendered through the API, read back with pdf-parse)', () => {
  let t: TestApp;
  let w: World;
  let designer: Session;
  let checker: Session;
  let fabricator: Session;

  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
    [designer, checker, fabricator] = await Promise.all([
      signIn(t, w.designer),
      signIn(t, w.checker),
      signIn(t, w.fabricator),
    ]);
    mkdirSync(ARTIFACTS, { recursive: true });
  });
  afterAll(async () => {
    await t.close();
  });

  it('requires sign-in', async () => {
    const c = await t.services.components.create(w.designer, w.projectId, {
      name: 'Anonymous probe',
      inputs: CASES[1]!.inputs,
    });
    await anonymous(t).get(`/api/revisions/${c.revision.id}/sheet.pdf`).expect(401);
  });

  it.each(CASES)(
    'renders a countersigned $kind sheet with hash, stamp, cautions and a known value',
    async (c) => {
      const created = await t.services.components.create(w.designer, w.projectId, {
        name: `Sheet ${c.kind}`,
        inputs: c.inputs,
      });
      const id = created.revision.id;
      await t.services.attachments.upload(w.designer, created.component.id, {
        originalName: `${c.kind} drawing.pdf`,
        bytes: Buffer.concat([TINY_PDF, Buffer.from(c.kind)]),
      });
      await t.services.revisions.submit(w.designer, id);
      await t.services.revisions.decide(w.checker, id, 'countersigned', {
        hash: created.revision.contentHash,
        comment: 'checked line by line',
      });
      const res = await fabricator.download(`/api/revisions/${id}/sheet.pdf?paper=letter`);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('application/pdf');
      expect(res.headers['x-hoopline-stamp']).toBe('review');
      const pdf = res.body as Buffer;
      expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
      writeFileSync(path.join(ARTIFACTS, `${c.kind}.pdf`), pdf);
      // pdf-parse reads the sheet's thin digit-group spaces ("47 496 100") as plain spaces.
      const text = (await pdfText(pdf)).replace(/\s+/g, ' ');
      expect(text).toContain(created.revision.contentHash);
      expect(text).toContain('FOR REVIEW — NOT FOR CONSTRUCTION');
      expect(text).not.toContain('DRAFT — NOT CHECKED');
      expect(text).toContain('Screening only — not a code calculation');
      // Greek symbols of the trail come through the sheet's fonts intact.
      expect(text).toMatch(/[σΔνγ]/);
      expect(text).toMatch(/qualified engineer/);
      for (const caution of created.revision.report.cautions) {
        expect(text).toContain(caution.title);
      }
      // The known value, source beside it in CASES: c.source.
      expect(text, c.source).toContain(c.expected);
      // Attachments as of the countersign are listed by name and hash.
      expect(text).toContain(`${c.kind} drawing.pdf`);
      // Every page numbered, in order, against one total (page-numbers.ts).
      const numbers = [...text.matchAll(/Page (\d+) of (\d+)/g)].map((m) => [
        Number(m[1]),
        Number(m[2]),
      ]);
      expect(numbers.length).toBeGreaterThan(0);
      expect(numbers).toEqual(numbers.map((_, i) => [i + 1, numbers.length]));
      expect(text).toContain('Checker');
    },
  );

  it('previews a draft for its designer and checker, stamped DRAFT, and refuses it to the fabricator', async () => {
    const created = await t.services.components.create(w.designer, w.projectId, {
      name: 'Draft preview',
      inputs: CASES[1]!.inputs,
    });
    const url = `/api/revisions/${created.revision.id}/sheet.pdf`;
    for (const session of [designer, checker]) {
      const res = await session.download(url);
      expect(res.status).toBe(200);
      expect(res.headers['x-hoopline-stamp']).toBe('draft');
      const text = await pdfText(res.body as Buffer);
      expect(text).toContain('DRAFT — NOT CHECKED');
      expect(text).not.toContain('FOR REVIEW — NOT FOR CONSTRUCTION');
    }
    const refused = await fabricator.get(url);
    expect(refused.status).toBe(404);
    expect(refused.body.error.code).toBe('not_found');
  });

  it('an issued sheet keeps naming the attachments it had at the countersign', async () => {
    const created = await t.services.components.create(w.designer, w.projectId, {
      name: 'Stable sheet',
      inputs: CASES[1]!.inputs,
    });
    const withdrawn = await t.services.attachments.upload(w.designer, created.component.id, {
      originalName: 'withdrawn before the check.pdf',
      bytes: Buffer.concat([TINY_PDF, Buffer.from('before')]),
    });
    await t.services.attachments.remove(w.designer, withdrawn.id);
    const kept = await t.services.attachments.upload(w.designer, created.component.id, {
      originalName: 'drawing at the check.pdf',
      bytes: Buffer.concat([TINY_PDF, Buffer.from('kept')]),
    });
    await t.services.revisions.submit(w.designer, created.revision.id);
    await t.services.revisions.decide(w.checker, created.revision.id, 'countersigned', {
      hash: created.revision.contentHash,
    });
    const url = `/api/revisions/${created.revision.id}/sheet.pdf`;
    const before = (await pdfText((await fabricator.download(url)).body as Buffer)).replace(
      /\s+/g,
      ' ',
    );
    // Removing the file from the component later does not change the issued sheet.
    await t.services.attachments.remove(w.designer, kept.id);
    const after = (await pdfText((await fabricator.download(url)).body as Buffer)).replace(
      /\s+/g,
      ' ',
    );
    for (const text of [before, after]) {
      expect(text).toContain('drawing at the check.pdf');
      expect(text).toContain(kept.sha256.slice(0, 32));
      expect(text).not.toContain('withdrawn before the check.pdf');
    }
    const list = await designer
      .get(`/api/components/${created.component.id}/attachments`)
      .expect(200);
    expect(list.body.items).toEqual([]);
  });

  it('audits every download', async () => {
    const created = await t.services.components.create(w.designer, w.projectId, {
      name: 'Audited',
      inputs: CASES[0]!.inputs,
    });
    const res = await designer.download(`/api/revisions/${created.revision.id}/sheet.pdf?paper=a4`);
    expect(res.status).toBe(200);
    const events: Array<{
      action: string;
      summary: { after: { stamp: string; paperSize: string } };
    }> = await t.dataSource.query(
      `select action, summary from audit_events where entity_id = $1 and action = 'sheet.downloaded'`,
      [created.revision.id],
    );
    expect(events).toHaveLength(1);
    expect(events[0]!.summary.after).toMatchObject({ stamp: 'draft', paperSize: 'A4' });
  });

  it('refuses a paper size it does not know, naming the field', async () => {
    const created = await t.services.components.create(w.designer, w.projectId, {
      name: 'Paper',
      inputs: CASES[0]!.inputs,
    });
    const res = await designer.get(`/api/revisions/${created.revision.id}/sheet.pdf?paper=a3`);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: 'paper', message: 'must be "a4" or "letter"' }]);
  });

  it('turns one sheet into PNG pages with pdftoppm (kept as a test artifact)', () => {
    const pdf = path.join(ARTIFACTS, 'cylindrical-shell.pdf');
    execFileSync('pdftoppm', ['-r', '60', '-png', pdf, path.join(ARTIFACTS, 'cylindrical-shell')]);
    const first = path.join(ARTIFACTS, 'cylindrical-shell-1.png');
    const png = execFileSync('head', ['-c', '8', first]);
    expect(png.subarray(1, 4).toString()).toBe('PNG');
  });

  it('verify: a countersigned sheet matches, a later countersign supersedes it, a made-up code does not match', async () => {
    const first = await t.services.components.create(w.designer, w.projectId, {
      name: 'Verify me',
      inputs: CASES[1]!.inputs,
    });
    await t.services.revisions.submit(w.designer, first.revision.id);
    await t.services.revisions.decide(w.checker, first.revision.id, 'countersigned', {
      hash: first.revision.contentHash,
    });
    const code = first.revision.verifyCode;
    const now = await anonymous(t).get(`/api/verify/${code}`).expect(200);
    expect(now.body).toMatchObject({
      match: true,
      status: 'current',
      componentName: 'Verify me',
      revisionNumber: 1,
    });
    // What the sheet prints, so its holder can compare the paper with it, and nothing else.
    expect(Object.keys(now.body).sort()).toEqual(
      [
        'componentName',
        'contentHash',
        'countersignedAt',
        'countersignedBy',
        'governing',
        'kind',
        'match',
        'material',
        'preparedBy',
        'projectNumber',
        'revisionNumber',
        'status',
        'thickness',
        'verdict',
      ].sort(),
    );
    const report = first.revision.report as unknown as {
      verdict: string;
      governing: { checkLabel: string; utilisation: number };
    };
    expect(now.body).toMatchObject({
      contentHash: first.revision.contentHash,
      kind: 'circular-plate',
      thickness: 0.01, // "10 mm" as typed
      material: 'Carbon steel plate (SA-516 Gr 70)',
      verdict: report.verdict,
      governing: {
        checkLabel: report.governing.checkLabel,
        utilisation: report.governing.utilisation,
      },
      preparedBy: w.designer.name,
      countersignedBy: w.checker.name,
    });

    const second = await t.services.revisions.create(w.designer, first.component.id, {
      inputs: { ...CASES[1]!.inputs, thickness: '11 mm' },
      baseVersion: first.component.version,
    });
    await t.services.revisions.submit(w.designer, second.revision.id);
    await t.services.revisions.decide(w.checker, second.revision.id, 'countersigned', {
      hash: second.revision.contentHash,
    });
    const later = await anonymous(t).get(`/api/verify/${code}`).expect(200);
    expect(later.body).toMatchObject({ match: true, status: 'superseded', revisionNumber: 1 });

    const made = await anonymous(t).get('/api/verify/0000-0000-0000').expect(200);
    expect(made.body).toEqual({ match: false });
  });
});
