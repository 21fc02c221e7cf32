import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeWorld, signIn, snapshot, type Session, type World } from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';

/** A carbon-steel shell under internal pressure: its MAWP follows the allowable-stress basis. */
function shellInputs(extra: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    kind: 'cylindrical-shell',
    diameter: '1000 mm',
    diameterBasis: 'inside',
    thickness: '8 mm',
    length: '2 m',
    material: 'carbon-steel',
    jointEfficiency: 1,
    loadCases: [
      { name: 'Design', internal: '10 bar(g)' },
      { name: 'Vacuum', internal: 'full vacuum' },
    ],
    ...extra,
  };
}

type Step = { id: string; value: number | null; label: string };
const stepOf = (report: { steps: Step[] }, id: string) => report.steps.find((s) => s.id === id)!;

describe('the project design basis: stored, validated, written into the component inputs (real PostgreSQL)', () => {
  let t: TestApp;
  let w: World;
  let designer: Session;
  beforeAll(async () => {
    t = await startTestApp();
    w = await makeWorld(t);
    designer = await signIn(t, w.designer);
  });
  afterAll(async () => {
    await t.close();
  });

  it('a project starts on the engine defaults: ASME VIII-1, standard barometer', async () => {
    const res = await designer.get(`/api/projects/${w.projectId}`).expect(200);
    expect(res.body.designBasis).toEqual({ allowableStress: 'asme-viii-1', barometer: 'standard' });
    // Components of a default project keep their inputs as typed: no designBasis is added.
    const saved = await designer
      .post(`/api/projects/${w.projectId}/components`, { name: 'Shell A', inputs: shellInputs() })
      .expect(201);
    expect(saved.body.revision.inputs.designBasis).toBeUndefined();
    expect(saved.body.revision.report.designBasis).toEqual({
      allowableStress: 'asme-viii-1',
      barometer: 'standard',
    });
  });

  it('created with a basis; a change of one key keeps the other; bad values name the field and change nothing', async () => {
    const created = await designer
      .post('/api/projects', {
        number: 'DB-1',
        name: 'Design basis',
        unitSystem: 'si',
        designBasis: { allowableStress: 'en-13445-3' },
      })
      .expect(201);
    expect(created.body.designBasis).toEqual({
      allowableStress: 'en-13445-3',
      barometer: 'standard',
    });
    const patched = await designer
      .patch(`/api/projects/${created.body.id}`, {
        designBasis: { barometer: 'high' },
        version: created.body.version,
      })
      .expect(200);
    expect(patched.body.designBasis).toEqual({ allowableStress: 'en-13445-3', barometer: 'high' });

    const before = await snapshot(t);
    const bad = await designer.patch(`/api/projects/${created.body.id}`, {
      designBasis: { allowableStress: 'pd-5500' },
      version: patched.body.version,
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual([
      { path: 'designBasis.allowableStress', message: 'must be "asme-viii-1" or "en-13445-3"' },
    ]);
    const unknown = await designer.post('/api/projects', {
      number: 'DB-2',
      name: 'x',
      unitSystem: 'si',
      designBasis: { barometer: 'high', margin: 2 },
    });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields[0].path).toBe('designBasis');
    expect(await snapshot(t)).toEqual(before);
  });

  it('the project basis goes into the inputs of new revisions, moves their numbers, and saved revisions keep theirs', async () => {
    const plain = await designer
      .post(`/api/projects/${w.projectId}/components`, { name: 'Shell B', inputs: shellInputs() })
      .expect(201);
    const project = await designer.get(`/api/projects/${w.projectId}`).expect(200);
    await designer
      .patch(`/api/projects/${w.projectId}`, {
        designBasis: { allowableStress: 'en-13445-3', barometer: 'high' },
        version: project.body.version,
      })
      .expect(200);
    const next = await designer
      .post(`/api/components/${plain.body.component.id}/revisions`, {
        inputs: shellInputs(),
        baseVersion: plain.body.component.version,
      })
      .expect(201);
    const inputs = next.body.revision.inputs;
    expect(inputs.designBasis).toEqual({ allowableStress: 'en-13445-3', barometer: 'high' });
    const report = next.body.revision.report;
    // EN 13445-3 f = min(R_p0.2/1.5, R_m/2.4) = 260/1.5 MPa for SA-516-70 (the yield term; from memory).
    expect(stepOf(report, 'allowable-stress').label).toContain('EN 13445-3 basis');
    expect(stepOf(report, 'allowable-stress').value).toBeCloseTo(173.333e6, -3);
    // A high barometer: the project's site at 340 m, raised by 105/101.325.
    expect(report.ambient.barometer).toBe('high');
    expect(report.ambient.pressure / report.ambient.standardPressure).toBeCloseTo(
      105 / 101.325,
      12,
    );
    // Revision 1 is unchanged: ASME basis, standard barometer.
    const first = await designer.get(`/api/revisions/${plain.body.revision.id}`).expect(200);
    expect(stepOf(first.body.report, 'allowable-stress').label).toContain('ASME VIII-1 basis');
    expect(first.body.report.ambient.barometer).toBeUndefined();
    // Inputs that carry their own basis keep it.
    const own = await designer
      .post(`/api/projects/${w.projectId}/components`, {
        name: 'Shell C',
        inputs: shellInputs({ designBasis: { allowableStress: 'asme-viii-1' } }),
      })
      .expect(201);
    expect(own.body.revision.inputs.designBasis).toEqual({ allowableStress: 'asme-viii-1' });
    expect(own.body.revision.report.designBasis.barometer).toBe('standard');
  });
});
