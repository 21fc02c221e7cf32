import { expect, test, type ConsoleMessage, type Page } from '@playwright/test';
import { signIn } from '../support/fixtures';
import { SEEDED_ADMIN } from '../support/people';

/**
 * The first load of a page, as a browser opening a link: no console warning
 * or error (React Router's HydrateFallback warning among them), and the
 * sign-in page does not fetch the signed-in screens or the engine (their
 * chunks load with their routes).
 */
function watchConsole(page: Page): string[] {
  const said: string[] = [];
  page.on('console', (message: ConsoleMessage) => {
    if (message.type() !== 'warning' && message.type() !== 'error') return;
    // Chromium logs every 4xx response; a signed-out visitor's session probe
    // (GET /api/me, then one POST /api/auth/refresh) answers 401 by design.
    const where = message.location().url;
    if (
      message.text().includes('status of 401') &&
      /\/api\/(me|auth\/refresh)$/.test(new URL(where || 'http://x/').pathname)
    ) {
      return;
    }
    said.push(`${message.type()}: ${message.text()} (${where})`);
  });
  page.on('pageerror', (error) => said.push(`page error: ${error.message}`));
  return said;
}

function watchScripts(page: Page): string[] {
  const scripts: string[] = [];
  page.on('response', (response) => {
    const url = new URL(response.url());
    if (url.pathname.endsWith('.js')) scripts.push(url.pathname);
  });
  return scripts;
}

test('the sign-in page loads without a console warning and without the workbench', async ({
  page,
}) => {
  const said = watchConsole(page);
  const scripts = watchScripts(page);
  await page.goto('/');
  await expect(page).toHaveURL(/\/sign-in$/);
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await page.waitForLoadState('networkidle');
  expect(said).toEqual([]);
  expect(scripts.length).toBeGreaterThan(0);
  expect(scripts.filter((s) => /\/(workbench|component|fields)-/.test(s))).toEqual([]);
});

test('a signed-in page opened directly loads without a console warning', async ({ page }) => {
  await page.goto('/sign-in');
  await signIn(page, SEEDED_ADMIN);
  const said = watchConsole(page);
  // A first load with a session: the session loader and the screen's chunk resolve before it shows.
  await page.goto('/projects');
  await expect(page.getByRole('heading', { name: 'Projects' })).toBeVisible();
  await page.waitForLoadState('networkidle');
  expect(said).toEqual([]);
});
