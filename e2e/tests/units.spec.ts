import { execFileSync } from 'node:child_process';
import { expect, expectAccessible, signIn, test } from '../support/fixtures';
import { Api, createPerson } from '../support/people';

/**
 * Issue 16.5, units: a US customary project shows its numbers in psi and its
 * vacuum in torr to a member whose own setting is SI; the member picks mTorr
 * for vacuum levels on the account page and sees it; the project's sheet
 * downloads on US Letter without anyone asking for it (page size read with
 * poppler's pdfinfo).
 */
test.describe.configure({ mode: 'serial' });

const run = Date.now().toString(36).toUpperCase();

test('a US project shows psi and torr; a person picks mTorr and sees it; the sheet downloads on Letter', async ({
  page,
  cast,
}) => {
  const owner = await Api.signIn(cast.admin.base, cast.designer.email, cast.designer.password);
  const project = await owner.send<{ id: string }>('POST', '/projects', {
    number: `U-${run}`,
    name: 'Bake-out chamber',
    unitSystem: 'us',
  });
  const made = await owner.send<{ component: { id: string } }>(
    'POST',
    `/projects/${project.id}/components`,
    {
      name: 'Chamber shell',
      inputs: {
        kind: 'cylindrical-shell',
        diameter: '1000 mm',
        diameterBasis: 'outside',
        thickness: '5 mm',
        length: '1.2 m',
        ends: 'closed',
        material: 'stainless-304',
        loadCases: [{ name: 'Bake-out at 3e-6 torr', internal: '3e-6 torr' }],
      },
    },
  );
  // A reader of their own (SI, the default), so that no other journey sees their choice.
  const reader = await createPerson(cast.admin, 'Units reader');
  await owner.send('PUT', `/projects/${project.id}/members/${reader.id}`, { role: 'designer' });

  await page.goto(`/components/${made.component.id}`);
  await signIn(page, reader);
  // The project's units are the default display: US, though the reader's own setting is SI.
  await expect(page.getByRole('radio', { name: 'US' })).toBeChecked();
  const line = page.getByText(/^Inside .* \(abs\), outside/).first();
  // 3e-6 torr stays in torr, never psi; the ambient (101 325 Pa / 6894.757 Pa/psi) is 14.7 psi.
  await expect(line).toContainText('Inside 3e-6 torr (abs)');
  await expect(line).toContainText(/outside ambient 14\.7 psi\(a\)/);
  await expect(page.getByRole('region', { name: 'Validity warnings' })).toContainText('psi');
  await expectAccessible(page, 'US project, torr');

  // The reader picks mTorr for vacuum levels: 3e-6 torr = 0.003 mTorr.
  await page.goto('/account');
  await page.getByLabel(/Vacuum levels/).selectOption('mTorr');
  await page.getByRole('button', { name: 'Save' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Saved.' })).toBeVisible();
  await expectAccessible(page, 'account, vacuum unit');
  await page.goto(`/components/${made.component.id}`);
  await expect(page.getByText(/^Inside .* \(abs\), outside/).first()).toContainText(
    'Inside 0.003 mTorr (abs)',
  );

  // The sheet: US Letter by default, 8.5 × 11 in = 612 × 792 pt (ANSI/ASME Y14.1).
  await expect(page.getByRole('combobox', { name: 'Paper size' })).toHaveValue('letter');
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Preview draft sheet' }).click(),
  ]);
  const file = await download.path();
  const info = execFileSync('pdfinfo', [file], { encoding: 'utf8' });
  expect(/Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(info)?.slice(1, 3)).toEqual(['612', '792']);
  await owner.dispose();
});
