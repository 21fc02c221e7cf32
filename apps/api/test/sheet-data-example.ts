import { METHODS, screen } from '@hoopline/calc';
import type { SheetData } from '../src/sheets/sheet-data';

/** A complete SheetData of one circular plate, for tests that render without the database. */
const plate = METHODS.find((m) => m.kind === 'circular-plate');
if (!plate) throw new Error('the circular-plate method is missing');
const inputs = plate.examples[0]!.input as Record<string, unknown>;
const report = screen(inputs);

export const sheet: SheetData = {
  project: { number: 'T-001', name: 'Test project', client: 'Test client', unitSystem: 'si' },
  component: { name: 'Test cover', kind: report.kind, tag: 'T-1' },
  revision: {
    number: 1,
    status: 'draft',
    contentHash: 'ab'.repeat(32),
    verifyCode: 'abab-abab-abab',
    engineVersion: report.engine.version,
    createdAt: '2026-12-01T09:00:00.000Z',
    submittedAt: null,
    note: '',
    inputs,
    report,
  },
  author: { name: 'Test Designer' },
  countersign: null,
  attachments: [],
  verifyUrl: 'http://127.0.0.1:8080/verify/abab-abab-abab',
  stamp: 'draft',
  paperSize: 'A4',
  generatedAt: '2026-12-01T10:00:00.000Z',
};
