import { expect, expectAccessible, signIn, signOut, test } from '../support/fixtures';
import { linkIn, waitForMail } from '../support/mailbox';
import { Api, createPerson } from '../support/people';

/**
 * Issue 16.3, who checks whom: a designer submits on a project with no
 * checker and is told nobody can check it yet and who can add a checker; the
 * members page says the same; a second designer (not the owner) sees no role
 * controls and who changes roles; the owner adds a checker, who gets a mail
 * naming the revision already waiting, with a link that opens it.
 */
test.describe.configure({ mode: 'serial' });

const run = Date.now().toString(36).toUpperCase();

test('no checker: submit warns, members page says who can add one; the new checker is told what waits', async ({
  page,
  cast,
}) => {
  const owner = await Api.signIn(cast.admin.base, cast.designer.email, cast.designer.password);
  const project = await owner.send<{ id: string }>('POST', '/projects', {
    number: `W-${run}`,
    name: 'Who checks bell jar',
    unitSystem: 'si',
  });
  const made = await owner.send<{ component: { id: string }; revision: { id: string } }>(
    'POST',
    `/projects/${project.id}/components`,
    {
      name: 'Bell jar lid',
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

  await page.goto(`/components/${made.component.id}`);
  await signIn(page, cast.designer);
  await page.getByRole('button', { name: 'Submit revision 1 for check' }).click();
  const warning = page.getByRole('status').filter({ hasText: 'nobody can check it yet' });
  await expect(warning).toBeVisible();
  await expect(warning).toContainText(cast.designer.name);
  await expectAccessible(page, 'submit warning');

  await warning.getByRole('link', { name: 'Members' }).click();
  await expect(page.getByRole('heading', { name: 'Members' })).toBeVisible();
  await expect(page.getByRole('status')).toContainText('This project has no checker');
  await signOut(page);

  // A second designer, not the owner: roles shown as text, and who changes them.
  const second = await createPerson(cast.admin, 'Second designer');
  await owner.send('PUT', `/projects/${project.id}/members/${second.id}`, { role: 'designer' });
  await page.goto(`/projects/${project.id}/members`);
  await signIn(page, second);
  await expect(page.getByRole('table', { name: 'Project members' })).toContainText(second.name);
  await expect(page.getByRole('combobox', { name: /Role of/ })).toHaveCount(0);
  await expect(page.getByText(`Only ${cast.designer.name} (the project’s owner)`)).toBeVisible();
  await expectAccessible(page, 'members, not the owner');
  await signOut(page);

  // The owner makes someone a checker: they hear about the revision already waiting.
  const since = new Date();
  await owner.send('PUT', `/projects/${project.id}/members/${cast.checker.id}`, {
    role: 'checker',
  });
  const mail = await waitForMail(cast.checker.email, { subject: /1 waiting for a check/, since });
  expect(mail.text).toContain('Bell jar lid rev 1');
  const link = linkIn(mail, /^\/revisions\/[^/]+$/);
  expect(link).toBe(`/revisions/${made.revision.id}`);
  await page.goto(link);
  await signIn(page, cast.checker);
  await expect(page).toHaveURL(new RegExp(`/revisions/${made.revision.id}`));
  await owner.dispose();
});
