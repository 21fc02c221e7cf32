import { expect, expectAccessible, screenshot, signIn, signOut, test } from '../support/fixtures';
import { Api, createPerson } from '../support/people';

/**
 * Issue 16.1, returned work: a checker returns a submitted revision with a
 * comment naming a step and a remark on another; the designer finds it under
 * "Returned to me", opens the workbench, reads the comment and the remark,
 * follows a step link to the marked trail row, saves a new revision, and the
 * list no longer shows it.
 */
test.describe.configure({ mode: 'serial' });

const run = Date.now().toString(36).toUpperCase();

test('returned with remarks by step: the designer reads them on the workbench, a new revision clears the list', async ({
  page,
  cast,
}) => {
  // People of their own, so the "returned to me" list holds this journey's work only.
  const designer = await createPerson(cast.admin, 'Returned designer', { mayCreateProjects: true });
  const checker = await createPerson(cast.admin, 'Returned checker');
  const owner = await Api.signIn(cast.admin.base, designer.email, designer.password);
  const project = await owner.send<{ id: string }>('POST', '/projects', {
    number: `R-${run}`,
    name: 'Returned work load lock',
    unitSystem: 'si',
  });
  await owner.send('PUT', `/projects/${project.id}/members/${checker.id}`, { role: 'checker' });
  const made = await owner.send<{ component: { id: string }; revision: { id: string } }>(
    'POST',
    `/projects/${project.id}/components`,
    {
      name: 'Load lock door',
      inputs: {
        kind: 'circular-plate',
        diameter: '400 mm',
        thickness: '10 mm',
        edge: 'clamped',
        material: 'stainless-304',
        deflectionLimit: '2 mm',
        loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
      },
    },
  );
  await owner.send('POST', `/revisions/${made.revision.id}/submit`, {});
  await owner.dispose();

  // The checker returns it: a comment naming step 3, a remark on step 2.
  await page.goto(`/revisions/${made.revision.id}`);
  await signIn(page, checker);
  await expect(page.getByRole('table', { name: 'Calculation trail' })).toBeVisible();
  await page.getByLabel('Comment').fill('The value in step 3 does not follow from the drawing.');
  await page.getByLabel('Step', { exact: true }).selectOption('2');
  await page.getByLabel('Remark', { exact: true }).fill('Which edge condition does the door have?');
  await page.getByRole('button', { name: 'Add remark' }).click();
  const toSend = page.getByRole('list', { name: 'Remarks to send' });
  await expect(toSend).toContainText('Step 2');
  await expectAccessible(page, 'review with a remark');
  await screenshot(page, 'review-remarks');
  await page.getByRole('button', { name: 'Return to designer' }).click();
  // The confirmation repeats the remark; only its button returns the revision.
  const confirm = page.getByRole('dialog', { name: 'Return this revision to the designer?' });
  await expect(confirm).toContainText('Step 2: Which edge condition does the door have?');
  await confirm.getByRole('button', { name: 'Return revision' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'returned' })).toBeVisible();
  await signOut(page);

  // The designer finds it under "Returned to me", beside the projects.
  await page.goto('/projects');
  await signIn(page, designer);
  const entry = page.getByRole('navigation', { name: 'Main' }).getByRole('link', {
    name: /Returned to me/,
  });
  await expect(entry).toContainText('1');
  await entry.click();
  await expect(page.getByRole('heading', { name: 'Returned to me' })).toBeVisible();
  await expect(page.getByRole('complementary', { name: 'Screening caution' })).toBeVisible();
  const row = page.getByRole('row', { name: /Load lock door · revision 1/ });
  await expect(row).toContainText(checker.name);
  await expect(row).toContainText('The value in step 3');
  await expectAccessible(page, 'returned to me');
  await screenshot(page, 'returned-to-me');

  await row.getByRole('link', { name: 'Load lock door · revision 1' }).click();
  await expect(page).toHaveURL(new RegExp(`/components/${made.component.id}$`));
  const notice = page.getByRole('region', { name: 'Revision 1 was returned to you' });
  await expect(notice).toContainText(`Returned by ${checker.name}`);
  await expect(notice).toContainText(/on \d{4}-\d{2}-\d{2} \d{2}:\d{2}/);
  await expect(notice).toContainText('does not follow from the drawing');
  await expect(notice).toContainText('Which edge condition does the door have?');
  await expect(page.getByRole('complementary', { name: 'Screening caution' })).toBeVisible();
  await expectAccessible(page, 'workbench with the returned notice');

  // The remark's link: the trail row of step 2, scrolled to and marked.
  await notice.getByRole('link', { name: /^Step 2 · / }).click();
  await expect(page).toHaveURL(/#trail-step-2$/);
  const step2 = page.locator('#trail-step-2');
  await expect(step2).toHaveAttribute('aria-current', 'location');
  await expect(step2).toBeInViewport();
  await expect(step2).toBeFocused();
  // The comment's "step 3" is a link too, and moves the mark.
  await notice.getByRole('link', { name: 'step 3' }).click();
  await expect(page.locator('#trail-step-3')).toHaveAttribute('aria-current', 'location');
  await expect(step2).not.toHaveAttribute('aria-current');
  await screenshot(page, 'workbench-returned');

  // An input changed: the trail below is the live one, numbered afresh, so the remark's link
  // opens step 2 on revision 1's own page (and back to the workbench to save).
  await page.getByLabel('Thickness', { exact: true }).fill('12 mm');
  await expect(notice).toContainText('You have changed inputs');
  const remarkLink = notice.getByRole('link', { name: /^Step 2 · / });
  await expect(remarkLink).toHaveAttribute('href', /\/revisions\/[^/#]+#trail-step-2$/);
  // In a new tab, so the unsaved thickness stays on the workbench.
  await expect(remarkLink).toHaveAttribute('target', '_blank');
  // Leaving for another page with the change unsaved asks first; staying keeps it.
  await page
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: /Returned to me/ })
    .click();
  const ask = page.getByRole('dialog', { name: 'Leave without saving?' });
  await expect(ask).toBeVisible();
  await expectAccessible(page, 'leave without saving');
  await screenshot(page, 'leave-without-saving');
  await ask.getByRole('button', { name: 'Stay on this page' }).click();
  await expect(ask).toBeHidden();
  await expect(page).toHaveURL(new RegExp(`/components/${made.component.id}(#[^/]*)?$`));
  await expect(page.getByLabel('Thickness', { exact: true })).toHaveValue('12 mm');
  // A new revision: the notice goes, and so does the row in "Returned to me".
  await page.getByRole('button', { name: 'Save as revision 2' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Saved as revision 2.' })).toBeVisible();
  await expect(notice).toHaveCount(0);
  await page
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: /Returned to me/ })
    .click();
  await expect(page.getByRole('heading', { name: 'Returned to me' })).toBeVisible();
  await expect(page.getByText('Nothing has been returned to you.')).toBeVisible();
  await expect(page.getByRole('row', { name: /Load lock door/ })).toHaveCount(0);
  await signOut(page);
});
