import { screen as engine } from '@hoopline/calc';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../api/client';
import type { Project } from '@hoopline/contract';
import { formatPercent as percent } from '@hoopline/present';
import { fakeApi, renderApp } from '../../test/render';
import { Link, useLocation } from 'react-router-dom';
import { KIND_FORMS } from './kind-forms';
import { Workbench } from './workbench';

const project = {
  id: 'p1',
  number: 'HL-1',
  name: 'Drying cabinet',
  site: {},
  siteAsTyped: {},
  ambientPressure: 101325,
  unitSystem: 'si',
  myRole: 'designer',
} as unknown as Project;

const template = KIND_FORMS['circular-plate']!.template('si');

function governingText(raw: Record<string, unknown>): string {
  return percent(engine(raw).governing!.utilisation);
}

function renderWorkbench(onSave = vi.fn(async () => undefined), onProject: Project = project) {
  fakeApi({ 'GET /projects/p1/materials': { body: { items: [] } } });
  renderApp(
    <Workbench
      project={onProject}
      kind="circular-plate"
      initialInputs={template}
      saveLabel="Save as revision 1"
      canSaveMaterials
      onSave={onSave}
    />,
  );
  return onSave;
}

function Where() {
  return <p data-testid="where">{useLocation().pathname}</p>;
}

/** The workbench at /components/c1 beside a link away, a link within the page and the path shown. */
function renderBesideLinks() {
  fakeApi({ 'GET /projects/p1/materials': { body: { items: [] } } });
  renderApp(
    <>
      <Link to="/projects">Projects</Link>
      <Link to="#trail-step-2">Step 2</Link>
      <Where />
      <Workbench
        project={project}
        kind="circular-plate"
        initialInputs={template}
        saveLabel="Save as revision 1"
        canSaveMaterials
        onSave={vi.fn(async () => undefined)}
      />
    </>,
    { path: '/components/c1' },
  );
}

describe('Workbench', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows the engine’s result at once and recomputes on every keystroke', async () => {
    renderWorkbench();
    const summary = () => screen.getByText(/^Governing:/).closest('p')!;
    expect(await screen.findByText(/^Governing:/)).toBeInTheDocument();
    expect(summary()).toHaveTextContent(governingText(template));

    const thickness = screen.getByLabelText('Thickness');
    await userEvent.clear(thickness);
    await userEvent.type(thickness, '8 mm');
    expect(summary()).toHaveTextContent(governingText({ ...template, thickness: '8 mm' }));
    expect(governingText({ ...template, thickness: '8 mm' })).not.toBe(governingText(template));
    expect(
      screen.getByText('Live result, computed in this browser: not saved', { exact: false }),
    ).toBeInTheDocument();
  });

  it('keeps the screening caution on screen', async () => {
    renderWorkbench();
    expect(
      await screen.findByRole('complementary', { name: 'Screening caution' }),
    ).toHaveTextContent('Screening only — not a code calculation');
  });

  it('puts the engine’s issue on the field and marks the result not current', async () => {
    renderWorkbench();
    const thickness = await screen.findByLabelText('Thickness');
    await userEvent.clear(thickness);
    await userEvent.type(thickness, '300 mm');
    // The engine's rule for circular plates: thickness below the radius (250 mm here).
    expect(thickness).toHaveAccessibleDescription('must be less than the radius');
    expect(
      screen.getByText(/Not current: these results are for the last inputs/),
    ).toBeInTheDocument();
    // No old verdict under the red banner: the badge is gone until the inputs read again.
    expect(screen.queryByText(/^(Passes|Fails|Outside validity|No checks)$/)).toBeNull();
    expect(screen.getByText('No verdict: inputs not readable')).toBeInTheDocument();
    // Nor an old pass or fail on each check: the figures stay, dimmed, marked not current.
    expect(screen.queryAllByText(/^(Pass|Fail)$/)).toHaveLength(0);
    expect(screen.getAllByText('not current').length).toBeGreaterThan(0);
    expect(screen.getByRole('button', { name: 'Save as revision 1' })).toBeDisabled();
    await userEvent.clear(thickness);
    await userEvent.type(thickness, '12 mm');
    expect(screen.getByText(/^(Passes|Fails|Outside validity|No checks)$/)).toBeInTheDocument();
  });

  it('names the bad load-case field', async () => {
    renderWorkbench();
    const inside = await screen.findByLabelText('Inside pressure');
    await userEvent.clear(inside);
    await userEvent.type(inside, '2 bar');
    expect(inside).toHaveAccessibleDescription(
      /ambiguous: write "2 bar\(a\)" for absolute or "2 bar\(g\)" for gauge/,
    );
  });

  it('leaves without a question while nothing has changed', async () => {
    renderBesideLinks();
    // Nothing changed yet: leaving asks nothing.
    await userEvent.click(await screen.findByRole('link', { name: 'Projects' }));
    expect(screen.getByTestId('where')).toHaveTextContent('/projects');
    expect(screen.queryByRole('dialog')).toBeNull();
  });

  it('with a changed input, leaving opens the question; stay keeps the edit, leave drops it', async () => {
    renderBesideLinks();
    const thickness = await screen.findByLabelText('Thickness');
    await userEvent.clear(thickness);
    await userEvent.type(thickness, '9 mm');
    // A link within the page (a trail step) passes.
    await userEvent.click(screen.getByRole('link', { name: 'Step 2' }));
    expect(screen.queryByRole('dialog')).toBeNull();

    await userEvent.click(screen.getByRole('link', { name: 'Projects' }));
    const ask = await screen.findByRole('dialog', { name: 'Leave without saving?' });
    expect(screen.getByTestId('where')).toHaveTextContent('/components/c1');
    await userEvent.click(within(ask).getByRole('button', { name: 'Stay on this page' }));
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(screen.getByLabelText('Thickness')).toHaveValue('9 mm');
    expect(screen.getByTestId('where')).toHaveTextContent('/components/c1');

    await userEvent.click(screen.getByRole('link', { name: 'Projects' }));
    await userEvent.click(
      within(await screen.findByRole('dialog')).getByRole('button', {
        name: 'Leave and drop the changes',
      }),
    );
    expect(screen.getByTestId('where')).toHaveTextContent('/projects');
  });

  it('saves the inputs only, with the project’s site', async () => {
    const onSave = renderWorkbench();
    await userEvent.click(await screen.findByRole('button', { name: 'Save as revision 1' }));
    await vi.waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    const [inputs] = onSave.mock.calls[0] as unknown as [Record<string, unknown>];
    expect(inputs).toEqual(template);
    expect(inputs).not.toHaveProperty('report');
  });

  it('computes with the project’s design basis, and saves it with the inputs as the server would', async () => {
    const steel = { ...template, material: 'carbon-steel' };
    const onSave = vi.fn(async () => undefined);
    fakeApi({ 'GET /projects/p1/materials': { body: { items: [] } } });
    renderApp(
      <Workbench
        project={
          {
            ...project,
            designBasis: { allowableStress: 'en-13445-3', barometer: 'high' },
          } as unknown as Project
        }
        kind="circular-plate"
        initialInputs={steel}
        saveLabel="Save as revision 1"
        canSaveMaterials
        onSave={onSave}
      />,
    );
    const expected = {
      ...steel,
      designBasis: { allowableStress: 'en-13445-3', barometer: 'high' },
    };
    // The live result is the engine's on the EN 13445-3 basis with a high barometer, not the default's.
    const summary = await screen.findByText(/^Governing:/);
    expect(summary.closest('p')!).toHaveTextContent(governingText(expected));
    expect(governingText(expected)).not.toBe(governingText(steel));
    await userEvent.click(screen.getByRole('button', { name: 'Save as revision 1' }));
    await vi.waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    const [inputs] = onSave.mock.calls[0] as unknown as [Record<string, unknown>];
    expect(inputs).toEqual(expected);
  });

  it('the design temperature field and a load case’s own temperature: the engine screens at them (its words on the fields)', async () => {
    const onSave = renderWorkbench();
    const summary = () => screen.getByText(/^Governing:/).closest('p')!;
    await screen.findByText(/^Governing:/);
    // The label and hint are the engine's (core/vocabulary.ts), with "(optional)".
    const field = screen.getByLabelText('Design temperature (optional)');
    expect(field).toHaveAccessibleDescription(/Built-in metals are derated to it/);
    await userEvent.type(field, '300 degC');
    const hot = { ...template, designTemperature: '300 degC' };
    expect(summary()).toHaveTextContent(governingText(hot));
    expect(governingText(hot)).not.toBe(governingText(template));
    // A load case at its own temperature.
    const caseField = screen.getByLabelText('Temperature of this case (optional)');
    await userEvent.type(caseField, '20 degC');
    const mixed = {
      ...hot,
      loadCases: [{ ...(template['loadCases'] as object[])[0], temperature: '20 degC' }],
    };
    expect(summary()).toHaveTextContent(governingText(mixed));
    await userEvent.click(screen.getByRole('button', { name: 'Save as revision 1' }));
    await vi.waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    const [inputs] = onSave.mock.calls[0] as unknown as [Record<string, unknown>];
    expect(inputs).toEqual(mixed);
  });

  it('a project’s default design temperature screens the components that give none, and the field says so', async () => {
    const onSave = vi.fn(async () => undefined);
    fakeApi({ 'GET /projects/p1/materials': { body: { items: [] } } });
    renderApp(
      <Workbench
        project={{ ...project, designTemperature: '250 degC' } as unknown as Project}
        kind="circular-plate"
        initialInputs={template}
        saveLabel="Save as revision 1"
        canSaveMaterials
        onSave={onSave}
      />,
    );
    const expected = { ...template, designTemperature: '250 degC' };
    const summary = await screen.findByText(/^Governing:/);
    expect(summary.closest('p')!).toHaveTextContent(governingText(expected));
    expect(screen.getByLabelText('Design temperature (optional)')).toHaveAccessibleDescription(
      /Blank in this project: the project’s 250 degC\./,
    );
    await userEvent.click(screen.getByRole('button', { name: 'Save as revision 1' }));
    await vi.waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    const [inputs] = onSave.mock.calls[0] as unknown as [Record<string, unknown>];
    expect(inputs).toEqual(expected);
  });

  it('maps the server’s 400 fields (inputs.<path>) onto the fields', async () => {
    const onSave = vi.fn(async () => {
      throw new ApiError(400, 'validation_failed', 'invalid', [
        { path: 'inputs.loadCases.0.name', message: 'is reserved on this server' },
      ]);
    });
    renderWorkbench(onSave);
    await userEvent.click(await screen.findByRole('button', { name: 'Save as revision 1' }));
    const name = await screen.findByLabelText('Name');
    await vi.waitFor(() => expect(name).toHaveAccessibleDescription('is reserved on this server'));
    expect(screen.getByRole('alert')).toHaveTextContent('The server could not accept some inputs');
  });

  it('lists every check with its utilisation bar', async () => {
    renderWorkbench();
    const table = await screen.findByRole('table', { name: /Checks for Operating: full vacuum/ });
    const report = engine(template);
    for (const check of report.cases[0]!.checks) {
      expect(
        within(table).getByRole('meter', { name: `${check.label}, Operating: full vacuum` }),
      ).toBeInTheDocument();
    }
  });
});

describe('Workbench: sections of stiffeners and rings', () => {
  afterEach(() => vi.unstubAllGlobals());

  function renderKind(
    kind: 'stiffened-wall' | 'cylindrical-shell',
    inputs: Record<string, unknown>,
  ) {
    const onSave = vi.fn(async () => undefined);
    fakeApi({ 'GET /projects/p1/materials': { body: { items: [] } } });
    renderApp(
      <Workbench
        project={project}
        kind={kind}
        initialInputs={inputs}
        saveLabel="Save as revision 1"
        canSaveMaterials
        onSave={onSave}
      />,
    );
    return onSave;
  }

  it('a stiffened wall: choosing an angle shows its dimensions, and the result follows them', async () => {
    const wall = KIND_FORMS['stiffened-wall']!.template('si');
    const onSave = renderKind('stiffened-wall', wall);
    expect(await screen.findByText(/^Governing:/)).toBeInTheDocument();
    expect(screen.getByLabelText('Stiffener depth (off the plate)')).toHaveValue('50 mm');
    await userEvent.selectOptions(
      screen.getByLabelText('Stiffener section'),
      'Angle (one leg standing, the other a free flange)',
    );
    // The shape's own fields, empty: the engine names each as required.
    const depth = screen.getByLabelText('Stiffener depth (off the plate)');
    expect(depth).toHaveValue('');
    await userEvent.type(depth, '60 mm');
    await userEvent.type(screen.getByLabelText('Stiffener flange width'), '60 mm');
    await userEvent.type(screen.getByLabelText('Stiffener thickness'), '6 mm');
    expect(screen.getByLabelText('Stiffener root radius (optional)')).toBeInTheDocument();
    const angle = {
      ...wall,
      stiffener: { shape: 'angle', depth: '60 mm', width: '60 mm', thickness: '6 mm' },
    };
    expect(screen.getByText(/^Governing:/).closest('p')!).toHaveTextContent(governingText(angle));
    await userEvent.click(screen.getByRole('button', { name: 'Save as revision 1' }));
    await vi.waitFor(() => expect(onSave).toHaveBeenCalled());
    expect((onSave.mock.calls[0] as unknown[])[0]).toMatchObject({ stiffener: angle.stiffener });
  });

  it('a cylinder: a ring section can be chosen and removed again', async () => {
    const shell = KIND_FORMS['cylindrical-shell']!.template('si');
    renderKind('cylindrical-shell', shell);
    const choice = await screen.findByLabelText('Stiffening-ring section (optional)');
    expect(choice).toHaveValue('');
    await userEvent.selectOptions(choice, 'Flat bar on edge');
    await userEvent.type(screen.getByLabelText('Ring depth (off the plate)'), '50 mm');
    await userEvent.type(screen.getByLabelText('Ring thickness'), '8 mm');
    expect(
      await screen.findByRole('table', { name: /Checks for Operating: full vacuum/ }),
    ).toHaveTextContent('ring');
    await userEvent.selectOptions(choice, 'No ring section (rings not checked)');
    expect(screen.queryByLabelText('Ring depth (off the plate)')).not.toBeInTheDocument();
  });
});
