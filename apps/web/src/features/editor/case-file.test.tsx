import { casesToCsv, screen as engine } from '@hoopline/calc';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Project } from '@hoopline/contract';
import { fakeApi, renderApp } from '../../test/render';
import { readCaseFile } from './case-file';
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

describe('case files in the CLI’s format', () => {
  let blobs: { blob: Blob; name: string }[] = [];
  beforeEach(() => {
    blobs = [];
    // jsdom has no object URLs: stand in for them, keeping the blob to read back.
    let last: Blob | null = null;
    URL.createObjectURL = vi.fn((blob: Blob) => {
      last = blob;
      return 'blob:case';
    });
    URL.revokeObjectURL = vi.fn();
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      if (last) blobs.push({ blob: last, name: this.download });
    });
  });
  afterEach(() => vi.restoreAllMocks());

  function renderWorkbench() {
    fakeApi({ 'GET /projects/p1/materials': { body: { items: [] } } });
    renderApp(
      <Workbench
        project={project}
        kind="circular-plate"
        initialInputs={template}
        saveLabel="Save"
        canSaveMaterials
        onSave={vi.fn(async () => undefined)}
      />,
    );
  }

  it('exports the case as JSON and as CSV that read back as the inputs screened', async () => {
    renderWorkbench();
    await userEvent.click(await screen.findByRole('button', { name: 'Export JSON' }));
    await userEvent.click(screen.getByRole('button', { name: 'Export CSV' }));
    expect(blobs.map((b) => b.name)).toEqual(['circular-plate.json', 'circular-plate.csv']);
    const json = readCaseFile(await blobs[0]!.blob.text(), 'x.json');
    const csv = readCaseFile(await blobs[1]!.blob.text(), 'x.csv');
    expect(json).toEqual(template);
    expect(csv).toEqual(template);
    expect(engine(csv).verdict).toBe(engine(template).verdict);
  });

  it('imports a CSV case into the form, and refuses a case of another kind, saying why', async () => {
    renderWorkbench();
    const file = new File([casesToCsv([{ ...template, thickness: '9 mm' }])], 'door.csv', {
      type: 'text/csv',
    });
    await userEvent.upload(await screen.findByLabelText('Import a case…'), file);
    expect(await screen.findByText(/Imported door\.csv/)).toBeInTheDocument();
    expect(screen.getByLabelText('Thickness')).toHaveValue('9 mm');

    const other = new File([JSON.stringify({ kind: 'pump-down', volume: '1 m3' })], 'pump.json', {
      type: 'application/json',
    });
    await userEvent.upload(screen.getByLabelText('Import a case…'), other);
    expect(await screen.findByRole('alert')).toHaveTextContent(
      /pump\.json was not imported: it is a case of kind "pump-down"; this component is a Circular flat plate/,
    );
    expect(screen.getByLabelText('Thickness')).toHaveValue('9 mm');
  });

  it('says what is wrong with a file it cannot read', () => {
    expect(() => readCaseFile('{"kind": ', 'a.json')).toThrow(/not valid JSON/);
    expect(() => readCaseFile('kind\r\n', 'a.csv')).toThrow(/no component row/);
    expect(() => readCaseFile('[1, 2]', 'a.json')).toThrow(/holds 2 components/);
  });
});
