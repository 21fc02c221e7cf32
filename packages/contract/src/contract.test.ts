import { COMPONENT_KINDS, type Verdict } from '@hoopline/calc';
import { describe, expect, expectTypeOf, it } from 'vitest';
import {
  type VERDICTS,
  componentKind,
  countersignBody,
  createProjectBody,
  packageVerifyParams,
  sheetQuery,
  verifyParams,
} from './index';

describe('the contract', () => {
  it('ties its enums to the engine: every verdict and every kind, no more', () => {
    expectTypeOf<(typeof VERDICTS)[number]>().toEqualTypeOf<Verdict>();
    expect(componentKind.options).toEqual([...COMPONENT_KINDS]);
  });

  it('keeps the request rules and messages the API answers with', () => {
    expect(sheetQuery.parse({})).toEqual({ paper: 'A4' });
    expect(sheetQuery.safeParse({ paper: 'a3' }).error?.issues[0]?.message).toBe(
      'must be "a4" or "letter"',
    );
    expect(verifyParams.parse({ code: 'ABCD-ef01-2345' })).toEqual({ code: 'abcdef012345' });
    // A package code keeps its "PKG" apart from a sheet's code; the digits after it are the lookup.
    expect(packageVerifyParams.parse({ code: ' pkg-3F9A-0c11-7be2' })).toEqual({
      code: '3f9a0c117be2',
    });
    expect(packageVerifyParams.safeParse({ code: 'abcd-ef01-2345' }).success).toBe(false);
    expect(packageVerifyParams.parse({ code: `PKG-${'a'.repeat(64)}` })).toEqual({
      code: 'a'.repeat(64),
    });
    expect(countersignBody.safeParse({ hash: 'x' }).error?.issues[0]?.message).toMatch(/64-digit/);
    // The site is checked by the engine's siteSchema and kept as typed.
    expect(
      createProjectBody.parse({
        number: 'P-1',
        name: 'P',
        unitSystem: 'us',
        site: { altitude: '5280 ft' },
      }).site,
    ).toEqual({ altitude: '5280 ft' });
    expect(
      createProjectBody.safeParse({
        number: 'P-1',
        name: 'P',
        unitSystem: 'us',
        site: { altitude: '5280' },
      }).error?.issues[0],
    ).toMatchObject({ path: ['site', 'altitude'] });
  });
});
