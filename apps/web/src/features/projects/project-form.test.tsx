import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../api/client';
import { renderApp } from '../../test/render';
import { ProjectForm, projectFormValues, type projectInput } from './project-form';

describe('ProjectForm', () => {
  it('requires a number and a name', async () => {
    const onSubmit = vi.fn();
    renderApp(
      <ProjectForm
        initialValues={projectFormValues(undefined, 'si')}
        submitLabel="Create"
        onSubmit={onSubmit}
      />,
    );
    await userEvent.click(await screen.findByRole('button', { name: 'Create' }));
    expect(await screen.findByText('Enter a project number')).toBeInTheDocument();
    expect(screen.getByText('Enter a project name')).toBeInTheDocument();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('reads the site altitude with the engine’s parser and sends it as typed', async () => {
    const onSubmit = vi.fn(async () => undefined);
    renderApp(
      <ProjectForm
        initialValues={projectFormValues(undefined, 'si')}
        submitLabel="Create"
        onSubmit={onSubmit}
      />,
    );
    await userEvent.type(await screen.findByLabelText(/Project number/), 'HL-7');
    await userEvent.type(screen.getByLabelText(/Project name/), 'Drying cabinet');
    await userEvent.selectOptions(screen.getByLabelText('Ambient pressure from'), 'altitude');
    await userEvent.type(screen.getByLabelText('Site altitude'), '5000 ft');
    await userEvent.click(screen.getByRole('button', { name: 'Create' }));
    await vi.waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    // As typed, so the project and its sheets show "5000 ft"; the API converts it (1524 m).
    const input = (onSubmit.mock.calls[0] as unknown as [ReturnType<typeof projectInput>])[0];
    expect(input.site).toEqual({ altitude: '5000 ft' });
    expect(input).toMatchObject({ number: 'HL-7', name: 'Drying cabinet', unitSystem: 'si' });
  });

  it('sends the design basis: ASME VIII-1 and the standard barometer unless chosen', async () => {
    const onSubmit = vi.fn(async () => undefined);
    renderApp(
      <ProjectForm
        initialValues={projectFormValues(undefined, 'si')}
        submitLabel="Create"
        onSubmit={onSubmit}
      />,
    );
    await userEvent.type(await screen.findByLabelText(/Project number/), 'HL-8');
    await userEvent.type(screen.getByLabelText(/Project name/), 'Receiver');
    expect(screen.getByLabelText('Allowable stress of metals')).toHaveValue('asme-viii-1');
    expect(screen.getByLabelText('Ambient for design')).toHaveValue('standard');
    await userEvent.selectOptions(
      screen.getByLabelText('Allowable stress of metals'),
      'en-13445-3',
    );
    await userEvent.selectOptions(screen.getByLabelText('Ambient for design'), 'high');
    await userEvent.click(screen.getByRole('button', { name: 'Create' }));
    await vi.waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    const input = (onSubmit.mock.calls[0] as unknown as [ReturnType<typeof projectInput>])[0];
    expect(input.designBasis).toEqual({ allowableStress: 'en-13445-3', barometer: 'high' });
  });

  it('shows a project’s saved design basis', async () => {
    renderApp(
      <ProjectForm
        initialValues={projectFormValues(
          {
            designBasis: { allowableStress: 'en-13445-3', barometer: 'high' },
          } as unknown as Parameters<typeof projectFormValues>[0],
          'si',
        )}
        submitLabel="Save"
        onSubmit={vi.fn()}
      />,
    );
    expect(await screen.findByLabelText('Allowable stress of metals')).toHaveValue('en-13445-3');
    expect(screen.getByLabelText('Ambient for design')).toHaveValue('high');
  });

  it('the default design temperature: read by the engine’s field, sent as typed; blank sends none', async () => {
    const onSubmit = vi.fn(async () => undefined);
    renderApp(
      <ProjectForm
        initialValues={projectFormValues(undefined, 'si')}
        submitLabel="Create"
        onSubmit={onSubmit}
      />,
    );
    await userEvent.type(await screen.findByLabelText(/Project number/), 'HL-9');
    await userEvent.type(screen.getByLabelText(/Project name/), 'Oven');
    const field = screen.getByLabelText('Design temperature (optional)');
    // Above the engine's 1000 °C: its own message (core/temperature.ts), nothing sent.
    await userEvent.type(field, '1200 degC');
    await userEvent.click(screen.getByRole('button', { name: 'Create' }));
    expect(
      await screen.findByText(/Design temperature must be at most 1000 °C/),
    ).toBeInTheDocument();
    expect(onSubmit).not.toHaveBeenCalled();
    await userEvent.clear(field);
    await userEvent.type(field, '180 degC');
    await userEvent.click(screen.getByRole('button', { name: 'Create' }));
    await vi.waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    const input = (onSubmit.mock.calls[0] as unknown as [ReturnType<typeof projectInput>])[0];
    expect(input.designTemperature).toBe('180 degC');
  });

  it('shows a project’s saved design temperature, and clearing it sends null', async () => {
    const onSubmit = vi.fn(async () => undefined);
    renderApp(
      <ProjectForm
        initialValues={projectFormValues(
          {
            number: 'HL-10',
            name: 'Oven',
            designTemperature: '350 degF',
          } as unknown as Parameters<typeof projectFormValues>[0],
          'us',
        )}
        submitLabel="Save"
        onSubmit={onSubmit}
      />,
    );
    const field = await screen.findByLabelText('Design temperature (optional)');
    expect(field).toHaveValue('350 degF');
    await userEvent.clear(field);
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    await vi.waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    const input = (onSubmit.mock.calls[0] as unknown as [ReturnType<typeof projectInput>])[0];
    expect(input.designTemperature).toBeNull();
  });

  it('refuses an altitude without a unit, or outside the standard atmosphere', async () => {
    renderApp(
      <ProjectForm
        initialValues={{ ...projectFormValues(undefined, 'si'), siteBasis: 'altitude' }}
        submitLabel="Create"
        onSubmit={vi.fn()}
      />,
    );
    const altitude = await screen.findByLabelText('Site altitude');
    await userEvent.type(altitude, '1500');
    await userEvent.tab();
    // The engine's own site schema and its words (the form once allowed up to 80 km, the
    // engine's standard atmosphere only to 20 km: the rule is no longer restated here).
    expect(
      await screen.findByText('Site altitude "1500" needs a unit, for example "1500 mm"'),
    ).toBeInTheDocument();
    await userEvent.clear(altitude);
    await userEvent.type(altitude, '100 km');
    await userEvent.tab();
    expect(await screen.findByText('Site altitude must be at most 20000 m')).toBeInTheDocument();
  });

  it('maps the server’s 400 fields onto the form, site.altitude onto the altitude field', async () => {
    const onSubmit = vi.fn(async () => {
      throw new ApiError(400, 'validation_failed', 'invalid', [
        { path: 'number', message: 'is already used by another project' },
        { path: 'site.altitude', message: 'must be at most 80000 m' },
      ]);
    });
    renderApp(
      <ProjectForm
        initialValues={{
          ...projectFormValues(undefined, 'si'),
          number: 'HL-1',
          name: 'X',
          siteBasis: 'altitude',
          altitude: '100 m',
        }}
        submitLabel="Create"
        onSubmit={onSubmit}
      />,
    );
    await userEvent.click(await screen.findByRole('button', { name: 'Create' }));
    expect(await screen.findByText('is already used by another project')).toBeInTheDocument();
    expect(screen.getByText('must be at most 80000 m')).toBeInTheDocument();
    expect(screen.getByLabelText('Site altitude')).toHaveAttribute('aria-invalid', 'true');
  });

  it('says a stale version in words a person can act on', async () => {
    const onSubmit = vi.fn(async () => {
      throw new ApiError(409, 'stale_version', 'stale');
    });
    renderApp(
      <ProjectForm
        initialValues={{ ...projectFormValues(undefined, 'si'), number: 'HL-1', name: 'X' }}
        submitLabel="Save"
        onSubmit={onSubmit}
      />,
    );
    await userEvent.click(await screen.findByRole('button', { name: 'Save' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'Someone else changed this in the meantime',
    );
  });
});
