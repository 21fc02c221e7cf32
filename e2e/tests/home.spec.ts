import { expect, test } from '@playwright/test';

test('the home page shows the product name and a live health indicator', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'Hoopline' })).toBeVisible();
  await expect(page.getByRole('status')).toContainText('Server and database online');
  await expect(page.getByText('Screening only, not a code calculation')).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/home.png', fullPage: true });
});
