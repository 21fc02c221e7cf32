import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeWorld, signIn, snapshot, type Session, type World } from '../../../test/fixtures';
import { startTestApp, type TestApp } from '../../../test/test-app';

/** A 304 door under vacuum: its allowable stress follows the design temperature. */
function doorInputs(extra: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    kind: 'rectangular-plate',
    width: '500 mm',
    height: '450 mm',
    thickness: '10 mm',
    edge: 'simply-supported',
    material: 'stainless-304',
    loadCases: [{ name: 'Vacuum', internal: 'full vacuum' }],
    ...extra,
  };
}

type Step = { id: string; value: number | null; label: string };
const stepOf = (report: { steps: Step[] }, id: string) => report.steps.find((s) => s.id === id);

describe('the project’s default design temperature: stored as typed, validated, written into component inputs that give none (real PostgreSQL)', () => {
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

  it('a project has none by default, and its components’ inputs stay as typed (room temperature)', async () => {
    const res = await designer.get(`/api/projects/${w.projectId}`).expect(200);
    expect(res.body.designTemperature).toBeNull();
    const saved = await designer
      .post(`/api/projects/${w.projectId}/components`, { name: 'Door A', inputs: doorInputs() })
      .expect(201);
    expect(saved.body.revision.inputs.designTemperature).toBeUndefined();
    expect(saved.body.revision.report.cautions[1].code).toBe('room-temperature');
  });

  it('created with one, kept as typed; changed, cleared with null; bad values name the field and change nothing', async () => {
    const created = await designer
      .post('/api/projects', {
        number: 'DT-1',
        name: 'Oven',
        unitSystem: 'us',
        designTemperature: '350 degF',
      })
      .expect(201);
    expect(created.body.designTemperature).toBe('350 degF');
    const patched = await designer
      .patch(`/api/projects/${created.body.id}`, {
        designTemperature: '180 degC',
        version: created.body.version,
      })
      .expect(200);
    expect(patched.body.designTemperature).toBe('180 degC');

    const before = await snapshot(t);
    for (const [value, message] of [
      ['1500 degC', /at most 1000 °C/],
      ['150 mm', /./],
      [true, /must be a temperature/],
    ] as const) {
      const bad = await designer.patch(`/api/projects/${created.body.id}`, {
        designTemperature: value,
        version: patched.body.version,
      });
      expect(bad.status).toBe(400);
      expect(bad.body.error.fields).toHaveLength(1);
      expect(bad.body.error.fields[0].path).toBe('designTemperature');
      expect(bad.body.error.fields[0].message).toMatch(message);
    }
    expect(await snapshot(t)).toEqual(before);

    const cleared = await designer
      .patch(`/api/projects/${created.body.id}`, {
        designTemperature: null,
        version: patched.body.version,
      })
      .expect(200);
    expect(cleared.body.designTemperature).toBeNull();
  });

  it('the project’s temperature goes into new revisions and derates them; inputs with their own keep theirs; saved revisions keep theirs', async () => {
    const plain = await designer
      .post(`/api/projects/${w.projectId}/components`, { name: 'Door B', inputs: doorInputs() })
      .expect(201);
    const project = await designer.get(`/api/projects/${w.projectId}`).expect(200);
    await designer
      .patch(`/api/projects/${w.projectId}`, {
        designTemperature: '200 degC',
        version: project.body.version,
      })
      .expect(200);
    const next = await designer
      .post(`/api/components/${plain.body.component.id}/revisions`, {
        inputs: doorInputs(),
        baseVersion: plain.body.component.version,
      })
      .expect(201);
    expect(next.body.revision.inputs.designTemperature).toBe('200 degC');
    const report = next.body.revision.report;
    expect(report.designTemperature).toBeCloseTo(473.15, 9);
    // ASME II-D Y-1 (SI transcription), SA-240 304: 144 MPa at 200 °C of 207 at 40 °C;
    // the allowable is 2/3 of the yield at temperature (II-D App. 1, from memory).
    expect(stepOf(report, 'allowable-stress')!.value).toBeCloseTo(
      (2 / 3) * 205e6 * (144 / 207),
      -1,
    );
    expect(report.cautions[1].code).toBe('design-temperature');
    // Revision 1 is as it was: room temperature.
    const first = await designer.get(`/api/revisions/${plain.body.revision.id}`).expect(200);
    expect(stepOf(first.body.report, 'design-temperature')).toBeUndefined();
    // A component that gives its own temperature keeps it.
    const own = await designer
      .post(`/api/projects/${w.projectId}/components`, {
        name: 'Door C',
        inputs: doorInputs({ designTemperature: '20 degC' }),
      })
      .expect(201);
    expect(own.body.revision.inputs.designTemperature).toBe('20 degC');
    expect(own.body.revision.report.designTemperature).toBeCloseTo(293.15, 9);
  });
});
