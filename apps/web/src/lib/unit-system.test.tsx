import { screen as runEngine } from '@hoopline/calc';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { UnitSystem } from '@hoopline/contract';
import { ChecksByCase, WarningsList } from '../features/results/report-view';
import { AccountRoute } from '../routes/account';
import { fakeApi, ME, renderApp } from '../test/render';
import {
  SESSION_UNITS_KEY,
  UnitSystemProvider,
  displayedUnitSystem,
  useChooseUnitSystem,
  useProjectUnits,
  useUnitSystem,
} from './unit-system';

// A chamber held at 3e-6 torr: NIST SP 811 Appendix B, 1 torr = 133.3224 Pa,
// so 3e-6 torr = 4.0e-4 Pa = 0.003 mTorr; 101 325 Pa / 6894.757 Pa/psi = 14.70 psi.
const report = runEngine({
  kind: 'cylindrical-shell',
  diameter: '1000 mm',
  diameterBasis: 'outside',
  thickness: '5 mm',
  length: '1.2 m',
  ends: 'closed',
  material: 'stainless-304',
  loadCases: [{ name: 'Bake-out', internal: '3e-6 torr' }],
} as never);

function Results() {
  const system = useUnitSystem();
  return (
    <>
      <p>Showing {system}</p>
      <ChecksByCase report={report} system={system} />
      <WarningsList report={report} system={system} />
    </>
  );
}

function ProjectPage({ system }: { system: UnitSystem }) {
  useProjectUnits(system);
  return <Results />;
}

function Switch() {
  const choose = useChooseUnitSystem();
  return (
    <button type="button" onClick={() => choose('si')}>
      SI for this session
    </button>
  );
}

function Shell() {
  const [onProject, setOnProject] = useState(true);
  return (
    <UnitSystemProvider system="si" vacuumUnit="mTorr">
      <Switch />
      <button type="button" onClick={() => setOnProject(false)}>
        Leave the project
      </button>
      {onProject ? <ProjectPage system="us" /> : <Results />}
    </UnitSystemProvider>
  );
}

afterEach(() => {
  window.sessionStorage.clear();
  vi.unstubAllGlobals();
});

describe('displayedUnitSystem (the rule)', () => {
  it('takes the session’s choice, else the project’s, else the person’s own', () => {
    expect(displayedUnitSystem({ account: 'si' })).toBe('si');
    expect(displayedUnitSystem({ account: 'si', project: 'us' })).toBe('us');
    expect(displayedUnitSystem({ account: 'si', project: 'us', session: 'si' })).toBe('si');
    expect(displayedUnitSystem({ account: 'us', project: null, session: null })).toBe('us');
  });
});

describe('a project’s unit system on its pages', () => {
  it('shows a US project in psi and its vacuum in the person’s mTorr, until the person switches', async () => {
    const user = userEvent.setup();
    render(<Shell />);
    expect(await screen.findByText('Showing us')).toBeInTheDocument();
    const line = screen.getByText(/^Inside .* \(abs\), outside/);
    expect(line).toHaveTextContent('Inside 0.003 mTorr (abs)');
    expect(line).toHaveTextContent(/outside ambient 14\.7 psi\(a\)/);
    expect(line).not.toHaveTextContent(/psi \(abs\), outside 14/);
    // The warnings speak US units too (105 kPa / 6894.757 = 15.23 psi).
    expect(screen.getByRole('region', { name: 'Validity warnings' })).toHaveTextContent(
      '15.23 psi',
    );

    await user.click(screen.getByRole('button', { name: 'SI for this session' }));
    expect(await screen.findByText('Showing si')).toBeInTheDocument();
    expect(window.sessionStorage.getItem(SESSION_UNITS_KEY)).toBe('si');
    expect(screen.getByText(/^Inside .* \(abs\), outside/)).toHaveTextContent(
      /outside ambient 101\.3 kPa\(a\)/,
    );
  });

  it('returns to the person’s own units off the project', async () => {
    const user = userEvent.setup();
    render(<Shell />);
    expect(await screen.findByText('Showing us')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Leave the project' }));
    expect(await screen.findByText('Showing si')).toBeInTheDocument();
  });
});

describe('the account page’s vacuum unit', () => {
  it('saves the chosen vacuum unit through PATCH /api/me', async () => {
    const user = userEvent.setup();
    const { calls } = fakeApi({
      'PATCH /me': (init) => ({
        body: { ...ME, user: { ...ME.user, ...JSON.parse(String(init?.body)) } },
      }),
    });
    renderApp(<AccountRoute />);
    const select = screen.getByLabelText(/Vacuum levels/);
    expect(select).toHaveValue('');
    expect(screen.getByRole('option', { name: 'The display units’ own (Pa)' })).toBeInTheDocument();
    await user.selectOptions(select, 'mTorr');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'PATCH')).toBe(true));
    const patch = calls.find((c) => c.method === 'PATCH')!;
    expect(JSON.parse(String(patch.init?.body))).toMatchObject({ vacuumUnit: 'mTorr' });
    expect(await screen.findByRole('status')).toHaveTextContent('Saved.');
  });

  it('sends null for the display units’ own', async () => {
    const user = userEvent.setup();
    const { calls } = fakeApi({
      'PATCH /me': (init) => ({
        body: { ...ME, user: { ...ME.user, ...JSON.parse(String(init?.body)) } },
      }),
    });
    renderApp(<AccountRoute />, { me: { ...ME, user: { ...ME.user, vacuumUnit: 'mbar' } } });
    const select = screen.getByLabelText(/Vacuum levels/);
    expect(select).toHaveValue('mbar');
    await user.selectOptions(select, '');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'PATCH')).toBe(true));
    const patch = calls.find((c) => c.method === 'PATCH')!;
    expect(JSON.parse(String(patch.init?.body)).vacuumUnit).toBeNull();
  });
});
