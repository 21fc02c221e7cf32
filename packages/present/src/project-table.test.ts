import type { ComponentTableRow } from '@hoopline/contract';
import { describe, expect, it } from 'vitest';
import {
  packageCode,
  percentFigure,
  presentTableRow,
  tableCsvRecord,
  TABLE_CSV_HEADER,
} from './project-table';

const row = (utilisation: number, engineVersion = '1.0.0'): ComponentTableRow => ({
  component: { id: 'c', name: 'Glovebox wall', kind: 'stiffened-wall', tag: 'GB-W1' },
  revision: {
    id: 'r',
    number: 2,
    status: 'countersigned',
    superseded: false,
    verdict: utilisation <= 1 ? 'pass' : 'fail',
    engineVersion,
    createdAt: '2026-03-14T09:12:05.123Z',
    submittedAt: '2026-03-14T10:00:00.000Z',
    decidedAt: null,
  },
  governing: {
    checkId: 'stiffener-stress',
    checkLabel: 'Bending stress at the stiffener',
    loadCase: 'Design underpressure',
    utilisation,
  },
  issuedRevisionNumber: 2,
});

describe('the project table in words', () => {
  it('keeps the side of 100 % (a pass never shows 100 %, a fail never shows it either)', () => {
    // The rule of formatPercent (percent.ts), applied to the table's cells and its CSV figure.
    expect(presentTableRow(row(0.9996), '1.0.0').utilisation).toBe('99.9 %');
    expect(presentTableRow(row(1.0004), '1.0.0').utilisation).toBe('100.1 %');
    expect(percentFigure(presentTableRow(row(0.9996), '1.0.0').utilisation)).toBe('99.9');
    // Large figures lose their thin-space groups in the CSV: a spreadsheet reads a number.
    expect(percentFigure(presentTableRow(row(125.4), '1.0.0').utilisation)).toBe('12540');
  });

  it('writes a CSV record of the same texts, ISO instants in UTC, blanks for none', () => {
    const record = tableCsvRecord('GB-1', row(0.5), '1.0.0');
    expect(record).toHaveLength(TABLE_CSV_HEADER.length);
    expect(record.slice(0, 10)).toEqual([
      'GB-1',
      'Glovebox wall',
      'GB-W1',
      'Stiffened flat wall',
      '2',
      'Countersigned',
      'Passes',
      'Bending stress at the stiffener',
      'Design underpressure',
      '50.0',
    ]);
    expect(record[11]).toBe('');
    expect(record.slice(12, 15)).toEqual(['2026-03-14T09:12:05Z', '2026-03-14T10:00:00Z', '']);
  });

  it('says when a stored report is another engine version’s', () => {
    expect(presentTableRow(row(0.5, '0.9.0'), '1.0.0').engineNote).toMatch(
      /engine 0\.9\.0 .*1\.0\.0.*not screened again/,
    );
    expect(
      presentTableRow({ ...row(0.5), revision: null, governing: null }, '1.0.0'),
    ).toMatchObject({ revision: '–', utilisation: '–', engineNote: null });
  });

  it('prints a package code from the first 12 digits of the package hash', () => {
    expect(packageCode('3f9a0c117be2' + '0'.repeat(52))).toBe('PKG-3f9a-0c11-7be2');
  });
});
