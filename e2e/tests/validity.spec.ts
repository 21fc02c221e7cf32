import { expect, screenshot, signIn, test } from '../support/fixtures';
import { Api } from '../support/people';

/**
 * Validity agrees everywhere (issue 16.4): the filer's acrylic viewport, 10 in
 * across and 1 in thick, sits at the thin-plate limit t/d = 0.1. The live
 * verdict, the validity warnings and the thickness sweep's band, current mark
 * and smallest passing thickness all follow the engine's one validity rule:
 * at 1 in it passes with the band beginning at the current thickness; at
 * 1.1 in, inside the band, it says "Outside validity" everywhere; and where
 * the smallest passing thickness lies in the band, the sweep says so and the
 * report at that thickness carries the warning.
 */
test.describe.configure({ mode: 'serial' });

const run = Date.now().toString(36).toUpperCase();
const viewport = (name: string, internal: string) => ({
  name,
  inputs: {
    kind: 'circular-plate',
    diameter: '10 in',
    thickness: '1 in',
    edge: 'simply-supported',
    material: 'cast-acrylic',
    loadCases: [{ name, internal }],
  },
});

test('the acrylic viewport: the verdict, the warnings and the sweep use one validity rule', async ({
  page,
  cast,
}) => {
  const designer = await Api.signIn(cast.admin.base, cast.designer.email, cast.designer.password);
  const project = await designer.send<{ id: string }>('POST', '/projects', {
    number: `V-${run}`,
    name: 'Validity journey viewports',
    unitSystem: 'us',
  });
  const made = async (c: ReturnType<typeof viewport>, label: string) =>
    (
      await designer.send<{ component: { id: string } }>(
        'POST',
        `/projects/${project.id}/components`,
        { name: label, inputs: c.inputs },
      )
    ).component.id;
  const vacuumWindow = await made(viewport('Full vacuum', 'full vacuum'), 'Viewport W-1');
  const proofWindow = await made(viewport('Proof test', '3 bar(g)'), 'Viewport W-2 (proof)');
  await designer.dispose();

  await page.goto(`/components/${vacuumWindow}`);
  await signIn(page, cast.designer);
  const results = page.getByRole('region', { name: 'Results' });
  const verdict = results.getByText(/^(Passes|Fails|Outside validity|No checks)$/).first();
  const sweep = page
    .getByRole('figure')
    .filter({ has: page.getByRole('img', { name: /Utilisation against thickness/ }) });
  const caption = sweep.locator('figcaption');
  const current = page.getByTestId('sweep-current');
  const thinPlate = page.getByText(/t\/d = [\d.]+ exceeds 0\.1/);

  // At 1 in (t/d = 0.1, the limit itself): Passes, no thin-plate warning, and the band begins here.
  await expect(verdict).toHaveText('Passes');
  await expect(caption).toContainText(/from (25\.4 mm|1 in); results there are not reliable\./);
  await expect(caption).toContainText('The current thickness is inside the validity range.');
  await expect(current).not.toContainText('outside validity');
  await expect(thinPlate).toHaveCount(0);
  await screenshot(page, 'validity-viewport-at-limit');

  // At 1.1 in, inside the band: the verdict, the warning and the sweep's mark all say so.
  const thickness = page.getByLabel('Thickness', { exact: true });
  await thickness.fill('1.1 in');
  await expect(verdict).toHaveText('Outside validity');
  await expect(thinPlate).toHaveCount(1);
  await expect(thinPlate).toContainText('t/d = 0.11 exceeds 0.1');
  await expect(current).toContainText(/, outside validity$/);
  await expect(caption).toContainText(
    'The current thickness is outside the validity range: see the validity warnings.',
  );
  await screenshot(page, 'validity-viewport-in-band');

  // At a 3 bar(g) proof pressure the smallest passing thickness lies in the band: the sweep says so.
  await page.goto(`/components/${proofWindow}`);
  await expect(verdict).toHaveText('Fails');
  const minimum = page.getByTestId('sweep-minimum');
  await expect(minimum).toContainText(/, outside validity$/);
  await expect(caption).toContainText(
    /Smallest thickness that passes: [\d.]+ (mm|in), outside the method's validity range: no basis for a decision\./,
  );
  const [, value, unit] = /min ([\d.]+) (mm|in)/.exec((await minimum.textContent()) ?? '')!;
  // A hair above the printed minimum (4 significant figures) passes, inside the band: so the report says.
  await thickness.fill(`${(Number(value) * 1.005).toPrecision(5)} ${unit}`);
  await expect(verdict).toHaveText('Outside validity');
  await expect(thinPlate).toHaveCount(1);
  await expect(current).toContainText(/, outside validity$/);
  await screenshot(page, 'validity-minimum-in-band');
});
