import { parse } from 'csv-parse/browser/esm/sync';
import { describe, expect, it } from 'vitest';
import { CalcInputError, METHODS, screen } from '../index';
import { casesToCsv, checksToCsv, csvField, readCsvCases } from './csv';

function issues(fn: () => unknown): string[] {
  try {
    fn();
  } catch (error) {
    if (error instanceof CalcInputError) return error.issues.map((i) => `${i.path}: ${i.message}`);
    throw error;
  }
  return [];
}

const TABLE = [
  'kind,name,diameter,thickness,edge,material,loadCases.0.name,loadCases.0.internal,loadCases.1.name,loadCases.1.internal',
  'circular-plate,Door A,500 mm,12 mm,clamped,stainless-304,Full vacuum,full vacuum,Vent,0.2 bar(g)',
  'circular-plate,"Port, ""B""",0.1,10 mm,simply-supported,cast-acrylic,Vacuum,0 torr,,',
  '',
].join('\r\n');

describe('readCsvCases', () => {
  it('builds nested inputs from dotted headers, leaving empty cells out', () => {
    const cases = readCsvCases(TABLE);
    expect(cases).toHaveLength(2);
    expect(cases[0]).toEqual({
      row: 2,
      input: {
        kind: 'circular-plate',
        name: 'Door A',
        diameter: '500 mm',
        thickness: '12 mm',
        edge: 'clamped',
        material: 'stainless-304',
        loadCases: [
          { name: 'Full vacuum', internal: 'full vacuum' },
          { name: 'Vent', internal: '0.2 bar(g)' },
        ],
      },
    });
    // RFC 4180 quoting: comma and doubled quote inside a quoted field; a plain number stays SI.
    expect(cases[1]!.row).toBe(3);
    expect(cases[1]!.input.name).toBe('Port, "B"');
    expect(cases[1]!.input.diameter).toBe(0.1);
    expect(cases[1]!.input.loadCases).toEqual([{ name: 'Vacuum', internal: '0 torr' }]);
  });

  it('gives inputs that screen like the same JSON', () => {
    const [first] = readCsvCases(TABLE);
    const json = {
      kind: 'circular-plate',
      name: 'Door A',
      diameter: '500 mm',
      thickness: '12 mm',
      edge: 'clamped',
      material: 'stainless-304',
      loadCases: [
        { name: 'Full vacuum', internal: 'full vacuum' },
        { name: 'Vent', internal: '0.2 bar(g)' },
      ],
    };
    expect(JSON.stringify(screen(first!.input))).toBe(JSON.stringify(screen(json)));
  });

  it('reads numbers, booleans, custom materials, LF line ends, a BOM and quoted line breaks', () => {
    const text =
      '\uFEFFkind,outline.shape,outline.sealDiameter,fastenerCount,loadCases.0.name,loadCases.0.internal,material.brittle\n' +
      'flat-area-load,circle,"500\nmm",12,"two\nlines",full vacuum,true\n';
    const [row] = readCsvCases(text);
    expect(row!.input).toEqual({
      kind: 'flat-area-load',
      outline: { shape: 'circle', sealDiameter: '500\nmm' },
      fastenerCount: 12,
      loadCases: [{ name: 'two\nlines', internal: 'full vacuum' }],
      material: { brittle: true },
    });
  });

  it('keeps a name that looks like a number as text', () => {
    const [row] = readCsvCases('kind,name,loadCases.0.name\nflat-area-load,123,42\n');
    expect(row!.input.name).toBe('123');
    expect(row!.input.loadCases).toEqual([{ name: '42' }]);
  });

  it('names the header or row of a malformed table', () => {
    expect(issues(() => readCsvCases(''))).toEqual([
      'csv: is empty: the first row names the fields',
    ]);
    expect(issues(() => readCsvCases('diameter\n1\n'))[0]).toBe('header: needs a "kind" column');
    expect(issues(() => readCsvCases('kind,kind\na,b\n'))[0]).toMatch(
      /^header: column 2 repeats "kind"/,
    );
    expect(issues(() => readCsvCases('kind,,x\na,b,c\n'))[0]).toMatch(
      /^header: column 2 has no field name/,
    );
    expect(issues(() => readCsvCases('kind,a..b\na,b\n'))[0]).toMatch(/^header: column 2/);
    expect(issues(() => readCsvCases('kind,loadCases.100.name\na,b\n'))[0]).toMatch(/index 100/);
    expect(issues(() => readCsvCases('kind,diameter\ncircular-plate\n'))[0]).toMatch(
      /^line 2: cannot be read as CSV/,
    );
    expect(issues(() => readCsvCases('kind,name\ncircular-plate,"open\n'))[0]).toMatch(
      /cannot be read as CSV/,
    );
    expect(
      issues(() =>
        readCsvCases('kind,material,material.name\ncircular-plate,stainless-304,Mine\n'),
      ),
    ).toEqual(['row 2.material.name: clashes with column "material" in the same row']);
  });
});

describe('checksToCsv', () => {
  it('writes one RFC 4180 row per check, readable back by a CSV parser', () => {
    const cases = readCsvCases(TABLE);
    const reports = cases.map((c) => screen(c.input));
    const csv = checksToCsv(
      reports,
      cases.map((c) => c.input.name as string),
    );
    expect(csv.endsWith('\r\n')).toBe(true);
    const rows = parse(csv, { columns: true }) as Record<string, string>[];
    const expected = reports.flatMap((r) => r.cases.flatMap((c) => c.checks));
    expect(rows).toHaveLength(expected.length);
    expect(rows[0]).toMatchObject({
      component: 'Door A',
      loadCase: 'Full vacuum',
      check: 'stress',
    });
    rows.forEach((row, i) => {
      const check = expected[i]!;
      expect(Number(row.demand)).toBe(check.demand);
      expect(Number(row.capacity)).toBe(check.capacity);
      expect(Number(row.utilisation)).toBe(check.utilisation);
      expect(row.pass).toBe(String(check.pass));
      expect(row.unit).toBe(check.unit);
    });
    expect(rows.some((r) => r.component === 'Port, "B"')).toBe(true);
  });

  it('falls back to the report title for a component without a name', () => {
    const [first] = readCsvCases(TABLE);
    const report = screen(first!.input);
    expect(checksToCsv([report]).split('\r\n')[1]!.startsWith(csvField(report.title))).toBe(true);
  });

  it('quotes only what needs quoting', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField(' edge')).toBe('" edge"');
    expect(csvField(0.1)).toBe('0.1');
    expect(csvField(false)).toBe('false');
  });
});

describe('casesToCsv', () => {
  it('writes every method example so that readCsvCases reads it back unchanged', () => {
    const inputs = METHODS.flatMap((m) =>
      m.examples.map((e) => e.input as Record<string, unknown>),
    );
    const text = casesToCsv(inputs);
    expect(text.split('\r\n')[0]!.startsWith('kind,')).toBe(true);
    const back = readCsvCases(text).map((c) => c.input);
    expect(back).toEqual(inputs);
    // And the cases screen as the originals do.
    back.forEach((input, i) => expect(screen(input).verdict).toBe(screen(inputs[i]).verdict));
  });

  it('quotes what RFC 4180 needs quoted', () => {
    const text = casesToCsv([{ kind: 'circular-plate', name: 'Door, "main"' }]);
    expect(text).toBe('kind,name\r\ncircular-plate,"Door, ""main"""\r\n');
  });
});
