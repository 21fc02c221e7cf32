import AxeBuilder from '@axe-core/playwright';
import { expect, test as base, type Page } from '@playwright/test';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Api, createPerson, SEEDED_ADMIN, type Person } from './people';

const SCREENS = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  '../test-results/screens',
);

export interface Cast {
  readonly admin: Api;
  readonly designer: Person;
  readonly checker: Person;
  readonly fabricator: Person;
}

/** A screenshot of a main screen, kept with the test results as an artifact. */
export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENS, { recursive: true });
  await page.screenshot({ path: path.join(SCREENS, `${name}.png`), fullPage: true });
}

/** axe-core on the page as it stands: no serious or critical violation (WCAG 2.x A and AA rules). */
export async function expectAccessible(page: Page, screen: string): Promise<void> {
  // Check the settled page: a colour transition still running (after a theme switch, say) would
  // be read half-way, with a contrast no one sees for long. Infinite animations are not waited on.
  await page.evaluate(() =>
    Promise.all(
      document
        .getAnimations()
        .filter((a) => a instanceof CSSTransition)
        .map((a) => a.finished.catch(() => undefined)),
    ),
  );
  const results = await new AxeBuilder({ page })
    .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'])
    .analyze();
  const bad = results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map(
      (v) =>
        `${v.id} (${v.impact}): ${v.help} — ${v.nodes
          .map((n) => n.target.join(' '))
          .slice(0, 5)
          .join('; ')}`,
    );
  expect(bad, `accessibility of ${screen}`).toEqual([]);
}

export async function signIn(
  page: Page,
  person: { email: string; password: string },
): Promise<void> {
  await page.getByLabel('E-mail').fill(person.email);
  await page.getByLabel('Password').fill(person.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  // Signed in once the app has left the sign-in page (for ?next= or Projects).
  await expect(page).not.toHaveURL(/\/sign-in/);
}

export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
}

/**
 * Every page of every journey runs under the API's Content-Security-Policy:
 * a `securitypolicyviolation` event in the page, or a console message of a
 * refused resource, fails the test (issue 13.7: the app works under its CSP).
 */
export const test = base.extend<object, { cast: Cast }>({
  page: async ({ page }, use, testInfo) => {
    const violations: string[] = [];
    await page.exposeBinding('__hooplineCspViolation', (_source, text: string) => {
      violations.push(text);
    });
    await page.addInitScript(() => {
      document.addEventListener('securitypolicyviolation', (e) => {
        const report = (window as unknown as { __hooplineCspViolation?: (t: string) => void })
          .__hooplineCspViolation;
        report?.(
          `${e.violatedDirective} blocked ${e.blockedURI || '(inline)'} at ${e.sourceFile}:${e.lineNumber}`,
        );
      });
    });
    page.on('console', (message) => {
      const text = message.text();
      if (/Content Security Policy|Refused to (load|execute|apply|connect|frame)/i.test(text))
        violations.push(`console: ${text}`);
    });
    await use(page);
    expect(violations, `CSP violations in "${testInfo.title}"`).toEqual([]);
  },
  cast: [
    // Playwright reads the fixture signature: a worker fixture with no dependencies takes `{}`.
    // eslint-disable-next-line no-empty-pattern
    async ({}, use, workerInfo) => {
      const baseURL = String(workerInfo.project.use.baseURL);
      const admin = await Api.signIn(baseURL, SEEDED_ADMIN.email, SEEDED_ADMIN.password);
      const cast: Cast = {
        admin,
        designer: await createPerson(admin, 'Designer', { mayCreateProjects: true }),
        checker: await createPerson(admin, 'Checker'),
        fabricator: await createPerson(admin, 'Fabricator'),
      };
      await use(cast);
      // The people stay (the audit log keeps what they did); deactivate them so they cannot sign in again.
      for (const person of [cast.designer, cast.checker, cast.fabricator]) {
        await admin.send('PATCH', `/users/${person.id}`, { active: false }).catch(() => undefined);
      }
      await admin.dispose();
    },
    { scope: 'worker' },
  ],
});

export { expect };
