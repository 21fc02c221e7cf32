import { expect, test } from '../support/fixtures';

test('a signed-out visitor lands on sign-in, with the product name and a live health indicator', async ({
  page,
}) => {
  await page.goto('/');
  await expect(page).toHaveURL(/\/sign-in$/);
  await expect(page.getByText('Hoopline').first()).toBeVisible();
  await expect(page.getByRole('status')).toContainText('Server and database online');
  await expect(page.getByText('Screening only — not a code calculation')).toBeVisible();
});
