import { expect, expectAccessible, screenshot, signIn, signOut, test } from '../support/fixtures';

/**
 * The journeys of the web issue, in order, on one project: a designer
 * creates a project and a door plate, sees the result change live as the
 * thickness changes, saves and submits; cannot countersign it; a checker
 * countersigns it from the queue; a fabricator sees the issued revision and
 * not the drafts. Each main screen is photographed and checked with axe.
 */
test.describe.configure({ mode: 'serial' });

const run = Date.now().toString(36).toUpperCase();
const projectNumber = `J-${run}`;
let projectPath = '';
let doorPath = '';

test('a designer creates a project and a door plate, sees results change live, saves and submits', async ({
  page,
  cast,
}) => {
  await page.goto('/projects');
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fprojects/);
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await expectAccessible(page, 'sign-in');
  await screenshot(page, 'sign-in');
  await signIn(page, cast.designer);

  await expect(page.getByRole('heading', { name: 'Projects' })).toBeVisible();
  await page.getByRole('link', { name: 'New project' }).click();
  await page.getByLabel('Project number').fill(projectNumber);
  await page.getByLabel('Project name').fill('Journey drying cabinet');
  await page.getByLabel('Client').fill('Larchmont Applied Materials Lab');
  await page.getByLabel('Ambient pressure from').selectOption('altitude');
  await page.getByLabel('Site altitude').fill('350 m');
  await expectAccessible(page, 'new project');
  await screenshot(page, 'project-new');
  await page.getByRole('button', { name: 'Create project' }).click();

  await expect(
    page.getByRole('heading', { name: `${projectNumber} Journey drying cabinet` }),
  ).toBeVisible();
  projectPath = new URL(page.url()).pathname;
  const projectId = projectPath.split('/').pop()!;
  // Membership of the other two, as an admin sets it up (the designer cannot list people).
  await cast.admin.send('PUT', `/projects/${projectId}/members/${cast.checker.id}`, {
    role: 'checker',
  });
  await cast.admin.send('PUT', `/projects/${projectId}/members/${cast.fabricator.id}`, {
    role: 'fabricator',
  });

  await page.getByRole('link', { name: 'New component' }).click();
  await page.getByLabel('Flat circular plate').click();
  await expect(page.getByText('Kind: Flat circular plate')).toBeVisible();
  await page.getByLabel('Component name').fill('Cabinet door plate');
  await page.getByLabel('Tag (optional)').fill('D-1');

  const summary = page.getByText(/^Governing:/);
  const verdict = page
    .getByRole('region', { name: 'Results' })
    .getByText(/^(Passes|Fails|Outside validity|No checks)$/)
    .first();
  await expect(summary).toBeVisible();
  await expect(verdict).toHaveText('Passes');
  const at12 = await summary.textContent();

  const thickness = page.getByLabel('Thickness', { exact: true });
  await thickness.fill('4 mm');
  // Recomputed in the browser on the keystroke, no server round trip: a 4 mm plate fails.
  await expect(verdict).toHaveText('Fails');
  await expect(summary).not.toHaveText(at12 ?? '');
  await expect(thickness).toHaveAccessibleDescription(/Reads as 0\.004 m/);

  await thickness.fill('10 mm');
  await expect(verdict).toHaveText('Passes');
  await expect(page.getByRole('complementary', { name: 'Screening caution' })).toContainText(
    'Screening only — not a code calculation',
  );
  await expect(page.getByRole('img', { name: /Utilisation against thickness/ })).toBeVisible();
  await expect(page.getByRole('img', { name: /Section of a flat circular plate/ })).toBeVisible();
  await expectAccessible(page, 'component editor');
  await screenshot(page, 'component-editor');
  // The dark theme follows the system preference while the choice is "System".
  await page.emulateMedia({ colorScheme: 'dark' });
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'dark');
  await expectAccessible(page, 'component editor, dark theme');
  await screenshot(page, 'component-editor-dark');
  await page.emulateMedia({ colorScheme: 'light' });
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'light');
  // US customary display, stored on the user (PATCH /api/me); the inputs stay as typed.
  await page.getByRole('radio', { name: 'US' }).check({ force: true });
  await expect(thickness).toHaveAccessibleDescription(/Reads as 0\.3937 in = 0\.01 m/);
  await expect(page.getByRole('table', { name: /Checks for/ })).toContainText('ksi');
  await expect(thickness).toHaveValue('10 mm');
  await page.getByRole('radio', { name: 'SI' }).check({ force: true });
  await expect(page.getByRole('table', { name: /Checks for/ })).toContainText('MPa');

  await page.getByRole('button', { name: 'Save as revision 1' }).click();
  await expect(page.getByText('Revision 1 as saved, computed by the server')).toBeVisible();
  doorPath = new URL(page.url()).pathname;
  await page.getByRole('button', { name: 'Submit revision 1 for check' }).click();
  await expect(page.getByText('Awaiting check').first()).toBeVisible();
  await expect(page.getByText(/Revision 1 is awaiting check/)).toBeVisible();
  await screenshot(page, 'component-submitted');

  // A second component left as a draft: the fabricator must never see it.
  await page.goto(`${projectPath}/components/new`);
  await page.getByLabel('Flat-area load and fasteners').click();
  await page.getByLabel('Component name').fill('Door latches (draft)');
  await page.getByRole('button', { name: 'Save as revision 1' }).click();
  await expect(page.getByText('Revision 1 as saved, computed by the server')).toBeVisible();

  await page.goto(projectPath);
  await expect(page.getByRole('link', { name: 'Cabinet door plate' })).toBeVisible();
  await expectAccessible(page, 'project');
  await screenshot(page, 'project');
  await page.goto('/projects');
  await expect(page.getByRole('link', { name: projectNumber })).toBeVisible();
  await expectAccessible(page, 'projects');
  await screenshot(page, 'projects');
});

test('the designer cannot countersign their own revision, and is told why', async ({
  page,
  cast,
}) => {
  await page.goto(doorPath);
  await signIn(page, cast.designer);
  await page.getByRole('link', { name: 'Revisions' }).click();
  await page.getByRole('link', { name: '1', exact: true }).click();
  const countersign = page.getByRole('button', { name: 'Countersign' });
  await expect(countersign).toBeDisabled();
  await expect(
    page.getByText(/You authored this revision, so you cannot countersign or return it/),
  ).toBeVisible();
  await expect(page.getByRole('button', { name: 'Return to designer' })).toBeDisabled();
  await expectAccessible(page, 'own revision');
  await screenshot(page, 'revision-own');
  await signOut(page);
});

test('a checker follows a deep link, then countersigns from the queue, which updates without a reload', async ({
  page,
  cast,
}) => {
  await page.goto(doorPath);
  await expect(page).toHaveURL(/\/sign-in\?next=/);
  await signIn(page, cast.checker);
  // Back where the link pointed.
  await expect(page).toHaveURL(new RegExp(`${doorPath}$`));
  await expect(page.getByRole('heading', { name: /Cabinet door plate/ })).toBeVisible();

  await page.getByRole('link', { name: /Check queue/ }).click();
  const row = page.getByRole('row', { name: /Cabinet door plate · revision 1/ });
  await expect(row).toBeVisible();
  await expectAccessible(page, 'check queue');
  await screenshot(page, 'check-queue');

  await row.getByRole('link', { name: /Cabinet door plate · revision 1/ }).click();
  await expect(page.getByRole('table', { name: 'Calculation trail' })).toBeVisible();
  await expect(page.getByRole('region', { name: 'Attachments' })).toBeVisible();
  await page
    .getByLabel('Comment')
    .fill('Trail read line by line; stress and deflection agree with Roark 11.2.');
  await expectAccessible(page, 'review');
  await screenshot(page, 'review');
  // Readable on a tablet.
  await page.setViewportSize({ width: 820, height: 1180 });
  await expectAccessible(page, 'review on a tablet');
  await screenshot(page, 'review-tablet');
  await page.setViewportSize({ width: 1280, height: 720 });
  await page.getByRole('button', { name: 'Countersign' }).click();

  await expect(page.getByRole('heading', { name: 'Check queue' })).toBeVisible();
  await expect(page.getByRole('row', { name: /Cabinet door plate · revision 1/ })).toHaveCount(0);
  await signOut(page);
});

test('a fabricator sees the issued revision and not the drafts', async ({ page, cast }) => {
  await page.goto('/issued');
  await signIn(page, cast.fabricator);
  await expect(page.getByRole('heading', { name: 'Issued' })).toBeVisible();
  const issued = page.getByRole('row', { name: /Cabinet door plate/ });
  await expect(issued).toBeVisible();
  await expect(issued.getByText('Passes', { exact: true })).toBeVisible();
  await expect(page.getByText('Door latches (draft)')).toHaveCount(0);
  // No download button until sheets exist: absent, not fake.
  await expect(page.getByRole('button', { name: /download/i })).toHaveCount(0);
  await expect(page.getByRole('link', { name: /download/i })).toHaveCount(0);
  await expectAccessible(page, 'issued');
  await screenshot(page, 'issued');

  await page.goto(projectPath);
  await expect(page.getByRole('link', { name: 'Cabinet door plate' })).toBeVisible();
  await expect(page.getByText('Door latches (draft)')).toHaveCount(0);
  await page.getByRole('link', { name: 'Cabinet door plate' }).click();
  await expect(page.getByText('Countersigned').first()).toBeVisible();
  await expect(page.getByRole('button', { name: /Save as revision/ })).toHaveCount(0);
  await screenshot(page, 'fabricator-revision');
  await signOut(page);
});

test('an admin sees people and the audit log', async ({ page }) => {
  await page.goto('/people');
  await signIn(page, { email: 'theo.brandt@larchmont.example', password: 'theo-admin-demo-2026' });
  await expect(page.getByRole('heading', { name: 'People' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Accounts' })).toBeVisible();
  await expectAccessible(page, 'people');
  await screenshot(page, 'people');
  await page.getByRole('link', { name: 'Audit log' }).click();
  await expect(page.getByRole('table', { name: 'Audit events, newest first' })).toBeVisible();
  await expectAccessible(page, 'audit log');
  await screenshot(page, 'audit-log');
  // The seeded demo's acrylic viewport has a returned revision 1 and a revision 2: compare them.
  await page.getByRole('link', { name: 'Projects' }).click();
  await page.getByRole('link', { name: 'LAM-2026-014' }).click();
  await page.getByRole('link', { name: 'VDC-3 acrylic viewport' }).click();
  await page.getByRole('link', { name: 'Revisions' }).click();
  await expectAccessible(page, 'revisions');
  await screenshot(page, 'revisions');
  await page.getByLabel('Compare revision 1').check();
  await page.getByLabel('Compare revision 2').check();
  await page.getByRole('button', { name: 'Compare 1 and 2' }).click();
  await expect(page.getByRole('table', { name: /Changed inputs/ })).toBeVisible();
  await expect(page.locator('tr[data-changed="true"]').first()).toBeVisible();
  await expectAccessible(page, 'compare');
  await screenshot(page, 'compare');
  await page.goto('/no/such/page');
  await expect(page.getByRole('heading', { name: 'No such page' })).toBeVisible();
  await screenshot(page, 'not-found');
});

test('an invitation sent from People is accepted in the browser', async ({ page }) => {
  await page.goto('/people');
  await signIn(page, { email: 'theo.brandt@larchmont.example', password: 'theo-admin-demo-2026' });
  // On the People page, not still on sign-in (both have an E-mail field).
  await expect(page.getByRole('heading', { name: 'People' })).toBeVisible();
  const email = `invitee-${Date.now().toString(36)}@journeys.example`;
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Name').fill('Ines Invitee');
  await page.getByRole('button', { name: 'Send invitation' }).click();
  const link = await page.getByRole('textbox', { name: 'Link' }).inputValue();
  expect(link).toMatch(/\/invitation\/[^/]+$/);
  await signOut(page);
  await page.goto(link);
  await expect(page.getByRole('heading', { name: 'Accept your invitation' })).toBeVisible();
  await expect(page.getByLabel('E-mail')).toHaveValue(email);
  await page.getByLabel(/^Password/).fill('invitee-password-2026');
  await page.getByLabel('Repeat the password').fill('invitee-password-2026');
  await expectAccessible(page, 'accept invitation');
  await screenshot(page, 'accept-invitation');
  await page.getByRole('button', { name: 'Accept and sign in' }).click();
  await expect(page.getByRole('heading', { name: 'Projects' })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Ines Invitee' })).toBeVisible();
});
