import { expect, expectAccessible, screenshot, signIn, test } from '../support/fixtures';

/**
 * A designer builds a glovebox side wall from nothing in the workbench: a
 * project, a stiffened flat wall with its plate, spacing and flat-bar
 * stiffeners, sees the panel and stiffener checks, the sketch and the spacing
 * sweep change as the inputs do, and saves the first revision.
 */
const run = Date.now().toString(36).toUpperCase();

test('a designer builds a glovebox wall of stiffened panels, sees its result and saves it', async ({
  page,
  cast,
}) => {
  await page.goto('/projects');
  await signIn(page, cast.designer);
  await page.getByRole('link', { name: 'New project' }).click();
  await page.getByLabel('Project number').fill(`GB-${run}`);
  await page.getByLabel('Project name').fill('Glovebox line');
  await page.getByLabel('Client').fill('Larchmont Applied Materials Lab');
  await page.getByRole('button', { name: 'Create project' }).click();
  await expect(page.getByRole('heading', { name: `GB-${run} Glovebox line` })).toBeVisible();

  await page.getByRole('link', { name: 'New component' }).click();
  await page.getByLabel('Stiffened flat wall').click();
  await expect(page.getByText('Kind: Stiffened flat wall')).toBeVisible();
  await page.getByLabel('Component name').fill('Glovebox side wall');
  await page.getByLabel('Tag (optional)').fill('GB-W1');

  // The wall: 1 m between the frame's rails, 3 mm 316L, flat bars 50 × 6 mm.
  await page.getByLabel('Stiffener span', { exact: true }).fill('1000 mm');
  await page.getByLabel('Wall plate thickness', { exact: true }).fill('3 mm');
  await page.getByLabel('Stiffener section').selectOption({ label: 'Flat bar on edge' });
  await page.getByLabel('Stiffener depth (off the plate)').fill('50 mm');
  await page.getByLabel('Stiffener thickness', { exact: true }).fill('6 mm');

  const verdict = page
    .getByRole('region', { name: 'Results' })
    .getByText(/^(Passes|Fails|Outside validity|No checks)$/)
    .first();
  // Stiffeners 1.5 m apart: the panel between them deflects far past half its thickness.
  const spacing = page.getByLabel('Stiffener spacing', { exact: true });
  await spacing.fill('1500 mm');
  await expect(verdict).not.toHaveText('Passes');
  await spacing.fill('400 mm');
  await expect(verdict).toHaveText('Passes');
  await expect(page.getByText(/^Governing:/)).toContainText('Bending stress at the stiffener');

  const checks = page.getByRole('table', { name: /Checks for Design underpressure/ });
  await expect(checks).toContainText('Panel: maximum stress against the allowable stress');
  await expect(checks).toContainText('Stiffener deflection against the span limit');
  await expect(
    page.getByRole('img', { name: /Stiffened flat wall: flat bar 50 mm × 6 mm/ }),
  ).toBeVisible();
  await expect(
    page.getByRole('img', {
      name: /Utilisation against stiffener spacing\. .*Largest spacing that passes/,
    }),
  ).toBeVisible();
  await expect(page.getByRole('complementary', { name: 'Screening caution' })).toContainText(
    'Screening only — not a code calculation',
  );
  await expectAccessible(page, 'stiffened wall editor');
  await screenshot(page, 'stiffened-wall-editor');

  await page.getByRole('button', { name: 'Save as revision 1' }).click();
  await expect(page.getByText('Revision 1 as saved, computed by the server')).toBeVisible();
  await expect(page.getByText(/^Governing:/)).toContainText('Bending stress at the stiffener');
});
