import type { Page } from '@playwright/test';
import { expect, expectAccessible, screenshot, signIn, signOut, test } from '../support/fixtures';
import { Api, createPerson, type Person } from '../support/people';

/**
 * Issue 16.2, sign-off: Countersign and Return ask for confirmation in a
 * dialog that repeats what is signed (component, revision, verdict, content
 * hash); where the project asks for it, the checker types their password
 * again, a wrong one is refused on the field and signs nothing. Afterwards the
 * checker reads what was done and the next revision of their queue.
 *
 * The journey makes its own owner and checker, so the checker's queue holds
 * only this journey's three revisions, oldest first.
 */
test.describe.configure({ mode: 'serial' });

const run = Date.now().toString(36).toUpperCase();
const NAMES = ['Sight glass flange', 'Bell jar lid', 'Loading hatch'] as const;

interface Made {
  componentId: string;
  revisionId: string;
  hash: string;
  verifyCode: string;
}

let owner: Person;
let checker: Person;
let ownerApi: Api;
let projectId: string;
const made = new Map<string, Made>();

const plate = (thickness: string) => ({
  kind: 'circular-plate',
  diameter: '400 mm',
  thickness,
  edge: 'clamped',
  material: 'stainless-304',
  deflectionLimit: '2 mm',
  loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
});

const statusOf = async (name: string) =>
  (await ownerApi.send<{ status: string }>('GET', `/revisions/${made.get(name)!.revisionId}`))
    .status;

async function openDialog(page: Page, button: 'Countersign' | 'Return to designer') {
  await page.getByRole('button', { name: button, exact: true }).click();
  const dialog = page.getByRole('dialog');
  await expect(dialog).toBeVisible();
  return dialog;
}

test.beforeAll(async ({ cast }) => {
  owner = await createPerson(cast.admin, 'Sign-off owner', { mayCreateProjects: true });
  checker = await createPerson(cast.admin, 'Sign-off checker');
  ownerApi = await Api.signIn(cast.admin.base, owner.email, owner.password);
  const project = await ownerApi.send<{ id: string }>('POST', '/projects', {
    number: `SO-${run}`,
    name: 'Sign-off vacuum chamber',
    unitSystem: 'si',
  });
  projectId = project.id;
  await ownerApi.send('PUT', `/projects/${projectId}/members/${checker.id}`, { role: 'checker' });
  // Submitted in this order, so the queue (oldest first) lists them so.
  for (const [i, name] of NAMES.entries()) {
    const created = await ownerApi.send<{
      component: { id: string };
      revision: { id: string; contentHash: string; verifyCode: string };
    }>('POST', `/projects/${projectId}/components`, {
      name,
      tag: `SO-${i + 1}`,
      inputs: plate(`${12 + i} mm`),
    });
    await ownerApi.send('POST', `/revisions/${created.revision.id}/submit`);
    made.set(name, {
      componentId: created.component.id,
      revisionId: created.revision.id,
      hash: created.revision.contentHash,
      verifyCode: created.revision.verifyCode,
    });
  }
});

test.afterAll(async () => {
  await ownerApi?.dispose();
});

test('a checker countersigns through the dialog, then sees what was done and the next in the queue', async ({
  page,
}) => {
  const first = made.get(NAMES[0])!;
  await page.goto(`/revisions/${first.revisionId}`);
  await signIn(page, checker);
  await expect(page.getByRole('table', { name: 'Calculation trail' })).toBeVisible();
  await page.getByLabel('Comment').fill('Trail read; edge moment agrees with Roark.');

  const dialog = await openDialog(page, 'Countersign');
  await expect(dialog).toHaveAccessibleName('Countersign this revision?');
  await expect(dialog).toContainText(`${NAMES[0]} SO-1`);
  await expect(dialog).toContainText('Revision1');
  await expect(dialog).toContainText('Passes');
  await expect(dialog).toContainText(/Governing.+ in load case Operating: full vacuum at/);
  // The full content hash (read out, and on hover) and the short verify code.
  await expect(dialog).toContainText(first.hash);
  await expect(dialog).toContainText(first.verifyCode);
  await expect(dialog).toContainText('Trail read; edge moment agrees with Roark.');
  // No password: this project does not ask for it.
  await expect(dialog.getByLabel('Your password')).toHaveCount(0);
  await expectAccessible(page, 'countersign dialog');
  await screenshot(page, 'countersign-dialog');

  // Escape closes it and signs nothing.
  await page.keyboard.press('Escape');
  await expect(dialog).toBeHidden();
  expect(await statusOf(NAMES[0])).toBe('submitted');

  await openDialog(page, 'Countersign');
  await page.getByRole('button', { name: 'Countersign revision' }).click();
  const done = page.getByRole('status').filter({ hasText: 'countersigned' });
  await expect(done.getByRole('heading')).toHaveText(
    `Revision 1 of ${NAMES[0]} SO-1 countersigned`,
  );
  await expect(done.getByRole('button', { name: /Download sheet/ })).toBeVisible();
  const next = done.getByRole('link', { name: `${NAMES[1]} · revision 1` });
  await expect(next).toBeVisible();
  await expectAccessible(page, 'after countersigning');
  await screenshot(page, 'countersigned');
  expect(await statusOf(NAMES[0])).toBe('countersigned');

  await next.click();
  await expect(page).toHaveURL(new RegExp(`/revisions/${made.get(NAMES[1])!.revisionId}$`));
  await expect(page.getByRole('heading', { name: new RegExp(NAMES[1]) }).first()).toBeVisible();
  // The message was about the other revision: it is not repeated here.
  await expect(page.getByRole('status').filter({ hasText: 'countersigned' })).toHaveCount(0);
  await signOut(page);
});

test('the owner asks for the password at sign-off; a wrong one signs nothing, the right one signs', async ({
  page,
}) => {
  await page.goto(`/projects/${projectId}/settings`);
  await signIn(page, owner);
  const setting = page.getByRole('checkbox', {
    name: 'Checkers type their password again to countersign or return',
  });
  await expect(setting).not.toBeChecked();
  await setting.check();
  await page.getByRole('button', { name: 'Save sign-off setting' }).click();
  await expect(page.getByText('Saved: sign-off now asks for the password.')).toBeVisible();
  await expectAccessible(page, 'project settings');
  await signOut(page);

  const second = made.get(NAMES[1])!;
  await page.goto(`/revisions/${second.revisionId}`);
  await signIn(page, checker);
  await expect(
    page.getByText('This project asks for your password again to sign off.'),
  ).toBeVisible();
  const dialog = await openDialog(page, 'Countersign');
  await expect(dialog).toContainText(`${NAMES[1]} SO-2`);
  await expect(dialog).toContainText(second.hash);
  const password = dialog.getByLabel('Your password');
  await expect(password).toBeFocused();

  await password.fill(`${checker.password}-not`);
  await dialog.getByRole('button', { name: 'Countersign revision' }).click();
  await expect(dialog.getByText('Your password is wrong')).toBeVisible();
  await expect(password).toHaveAttribute('aria-invalid', 'true');
  await expectAccessible(page, 'wrong password');
  await screenshot(page, 'sign-off-wrong-password');
  expect(await statusOf(NAMES[1])).toBe('submitted');
  const audit = await ownerApi.send<{
    items: { action: string; target: { revision: { id: string } | null } }[];
  }>('GET', `/audit?projectId=${projectId}`);
  expect(
    audit.items.filter(
      (e) =>
        e.action === 'revision.sign_off_refused' && e.target.revision?.id === second.revisionId,
    ),
  ).toHaveLength(1);

  await password.fill(checker.password);
  await dialog.getByRole('button', { name: 'Countersign revision' }).click();
  const done = page.getByRole('status').filter({ hasText: 'countersigned' });
  await expect(done.getByRole('heading')).toHaveText(
    `Revision 1 of ${NAMES[1]} SO-2 countersigned`,
  );
  expect(await statusOf(NAMES[1])).toBe('countersigned');

  // The last one goes back, with a comment and the password; then nothing waits.
  await done.getByRole('link', { name: `${NAMES[2]} · revision 1` }).click();
  await page.getByLabel('Comment').fill('Step 5: use the clamped edge moment.');
  const back = await openDialog(page, 'Return to designer');
  await expect(back).toHaveAccessibleName('Return this revision to the designer?');
  await expect(back).toContainText('Step 5: use the clamped edge moment.');
  await back.getByLabel('Your password').fill(checker.password);
  await back.getByRole('button', { name: 'Return revision' }).click();
  const returned = page.getByRole('status').filter({ hasText: 'returned' });
  await expect(returned.getByRole('heading')).toHaveText(
    `Revision 1 of ${NAMES[2]} SO-3 returned to ${owner.name}`,
  );
  await expect(returned).toContainText('Your check queue is empty');
  expect(await statusOf(NAMES[2])).toBe('returned');
  await signOut(page);
});
