import type { Page } from '@playwright/test';
import { expect, expectAccessible, screenshot, signIn, test } from '../support/fixtures';
import { Api, SEEDED_ADMIN } from '../support/people';

/**
 * Phone and tablet (issue 16.7): at 390 px wide no page scrolls sideways
 * (document.scrollingElement.scrollWidth <= clientWidth), the navigation folds
 * behind a Menu button, and wide tables scroll inside their own areas. The
 * checker's queue and review page and the designer's workbench are the
 * journeys' own (a project made through the API); the other pages are
 * reached as they stand.
 */
test.describe.configure({ mode: 'serial' });
test.use({ viewport: { width: 390, height: 844 } });

const run = Date.now().toString(36).toUpperCase();
let componentPath = '';

async function expectNoSideScroll(page: Page, name: string): Promise<void> {
  const overflow = () =>
    page.evaluate(() => {
      const s = document.scrollingElement!;
      return s.scrollWidth - s.clientWidth;
    });
  expect(await overflow(), `${name} scrolls sideways at 390 px`).toBeLessThanOrEqual(0);
  await screenshot(page, `phone-${name}`);
}

async function openMenu(page: Page): Promise<void> {
  const menu = page.getByRole('button', { name: 'Menu' });
  await menu.click();
  await expect(menu).toHaveAttribute('aria-expanded', 'true');
}

async function signOutOnPhone(page: Page): Promise<void> {
  await openMenu(page);
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
}

test('a checker on a phone: folded navigation, queue and review page without sideways scrolling', async ({
  page,
  cast,
}) => {
  // A submitted revision waiting for this checker.
  const designer = await Api.signIn(cast.admin.base, cast.designer.email, cast.designer.password);
  const project = await designer.send<{ id: string }>('POST', '/projects', {
    number: `P-${run}`,
    name: 'Phone journey drying cabinet',
    unitSystem: 'si',
  });
  await designer.send('PUT', `/projects/${project.id}/members/${cast.checker.id}`, {
    role: 'checker',
  });
  const made = await designer.send<{ component: { id: string }; revision: { id: string } }>(
    'POST',
    `/projects/${project.id}/components`,
    {
      name: 'Phone cabinet door',
      tag: 'PH-1',
      inputs: {
        kind: 'rectangular-plate',
        width: '500 mm',
        height: '450 mm',
        thickness: '10 mm',
        edge: 'simply-supported',
        material: 'stainless-304',
        deflectionLimit: '1.5 mm',
        loadCases: [
          { name: 'Operating: full vacuum', internal: 'full vacuum' },
          { name: 'Vent back-fill: +0.2 bar', internal: '0.2 bar(g)' },
        ],
      },
    },
  );
  await designer.send('POST', `/revisions/${made.revision.id}/submit`);
  await designer.dispose();
  componentPath = `/components/${made.component.id}`;

  await page.goto('/sign-in');
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await expectNoSideScroll(page, 'sign-in');
  await signIn(page, cast.checker);
  await expect(page.getByRole('heading', { name: 'Projects' })).toBeVisible();
  await expectNoSideScroll(page, 'projects');

  // The navigation is folded: a Menu button, the links hidden until it opens, closed after a choice.
  const nav = page.getByRole('navigation', { name: 'Main' });
  await expect(nav).toBeHidden();
  await openMenu(page);
  await expect(nav).toBeVisible();
  await expectNoSideScroll(page, 'menu-open');
  await nav.getByRole('link', { name: /Check queue/ }).click();
  await expect(page.getByRole('heading', { name: 'Check queue' })).toBeVisible();
  await expect(nav).toBeHidden();
  await expect(page.getByRole('button', { name: 'Menu' })).toHaveAttribute(
    'aria-expanded',
    'false',
  );
  const row = page.getByRole('row', { name: /Phone cabinet door · revision 1/ });
  await expect(row).toBeVisible();
  await expectNoSideScroll(page, 'check-queue');
  await expectAccessible(page, 'check queue on a phone');

  await row.getByRole('link', { name: /Phone cabinet door · revision 1/ }).click();
  const trail = page.getByRole('table', { name: 'Calculation trail' });
  await expect(trail).toBeVisible();
  await expect(page.getByRole('img', { name: /Utilisation against thickness/ })).toBeVisible();
  await expectNoSideScroll(page, 'review');
  await expectAccessible(page, 'review on a phone');
  // The wide tables scroll inside their own areas: the trail's is wider than the phone.
  const trailArea = page.locator('[role="region"][aria-label="Calculation trail"]');
  const area = await trailArea.evaluate((el) => ({
    overflowX: getComputedStyle(el).overflowX,
    scrolls: el.scrollWidth > el.clientWidth,
  }));
  expect(area).toEqual({ overflowX: 'auto', scrolls: true });
  for (const table of await page.getByRole('table').all()) {
    const contained = await table.evaluate((el) => {
      for (let p = el.parentElement; p; p = p.parentElement)
        if (getComputedStyle(p).overflowX === 'auto') return true;
      return false;
    });
    expect(
      contained,
      `${(await table.locator('caption').textContent()) ?? 'a table'} in a scroll area`,
    ).toBe(true);
  }

  await page.goto('/issued');
  await expect(page.getByRole('heading', { name: 'Issued' })).toBeVisible();
  await expectNoSideScroll(page, 'issued');
  await page.goto('/account');
  await expect(page.getByRole('heading', { name: /Account/ })).toBeVisible();
  await expectNoSideScroll(page, 'account');
  await page.goto(`/projects/${project.id}`);
  await expect(page.getByRole('link', { name: 'Phone cabinet door' })).toBeVisible();
  await expectNoSideScroll(page, 'project');
  await signOutOnPhone(page);
});

test('a designer on a phone: the workbench and the revisions without sideways scrolling', async ({
  page,
  cast,
}) => {
  await page.goto(componentPath);
  await signIn(page, cast.designer);
  await expect(page.getByLabel('Thickness', { exact: true })).toBeVisible();
  await expect(page.getByRole('img', { name: /Utilisation against thickness/ })).toBeVisible();
  await expectNoSideScroll(page, 'workbench');
  await expectAccessible(page, 'workbench on a phone');
  // A thinner plate fails live; the page still fits.
  await page.getByLabel('Thickness', { exact: true }).fill('4 mm');
  await expect(
    page
      .getByRole('region', { name: 'Results' })
      .getByText(/^(Passes|Fails|Outside validity|No checks)$/)
      .first(),
  ).toHaveText('Fails');
  await expectNoSideScroll(page, 'workbench-fails');
  await page.goto(`${componentPath}/revisions`);
  await expect(page.getByRole('heading', { name: /: revisions$/ })).toBeVisible();
  await expectNoSideScroll(page, 'revisions');
  await signOutOnPhone(page);

  // The admin's pages, and the public verify page.
  await page.goto('/people');
  await signIn(page, SEEDED_ADMIN);
  await expect(page.getByRole('table', { name: 'Accounts' })).toBeVisible();
  await expectNoSideScroll(page, 'people');
  await page.goto('/audit-log');
  await expect(page.getByRole('table', { name: 'Audit events, newest first' })).toBeVisible();
  await expectNoSideScroll(page, 'audit-log');
  await signOutOnPhone(page);
  await page.goto('/verify');
  await expect(page.getByLabel('Verify code or content hash')).toBeVisible();
  await expectNoSideScroll(page, 'verify');
});
