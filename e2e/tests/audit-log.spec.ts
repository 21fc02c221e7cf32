import { readFile } from 'node:fs/promises';
import { expectAccessible, expect, signIn, test } from '../support/fixtures';
import { Api, SEEDED_ADMIN } from '../support/people';

// Issue 16.9: the audit log in words, linked to the records, filtered by project, exported as CSV.
test('an admin reads a project’s log in words, follows a link and downloads the CSV', async ({
  page,
  cast,
}) => {
  const designer = await Api.signIn(cast.admin.base, cast.designer.email, cast.designer.password);
  const number = `AL-${Date.now().toString(36)}`;
  const project = await designer.send<{ id: string }>('POST', '/projects', {
    number,
    name: 'Audit words rig',
    site: { altitude: 120 },
    unitSystem: 'si',
  });
  const created = await designer.send<{ component: { id: string } }>(
    'POST',
    `/projects/${project.id}/components`,
    {
      name: 'Lid',
      inputs: {
        kind: 'circular-plate',
        diameter: '500 mm',
        thickness: '12 mm',
        edge: 'clamped',
        material: 'stainless-304',
        deflectionLimit: '2 mm',
        loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
      },
    },
  );
  await designer.dispose();

  await page.goto('/audit-log');
  await signIn(page, SEEDED_ADMIN);
  await expect(page.getByRole('heading', { name: 'Audit log' })).toBeVisible();
  await page.getByRole('combobox', { name: 'Project' }).selectOption(project.id);
  await page.getByRole('button', { name: 'Filter' }).click();
  await expect(page).toHaveURL(new RegExp(`projectId=${project.id}`));

  const table = page.getByRole('table', { name: 'Audit events, newest first' });
  const row = table.getByRole('row').filter({ hasText: `${cast.designer.name} created Lid in` });
  await expect(row).toHaveCount(1);
  await expect(row).toContainText(/\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}Z/);
  await expect(table.getByRole('row').filter({ hasText: `created project ${number}` })).toHaveCount(
    1,
  );
  await expectAccessible(page, 'audit log in words');

  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Download CSV' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toMatch(
    new RegExp(`^audit-log-${number}-\\d{4}-\\d{2}-\\d{2}\\.csv$`),
  );
  const csv = await readFile((await file.path())!, 'utf8');
  expect(csv).toContain(`${cast.designer.name} created Lid in ${number} Audit words rig`);
  expect(csv).toContain('component.created');

  await row.getByRole('link', { name: 'Lid' }).click();
  await expect(page).toHaveURL(new RegExp(`/components/${created.component.id}$`));
});
