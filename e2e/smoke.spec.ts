import { test, expect } from '@playwright/test';

test('the workbench page loads', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { name: 'Polewright' })).toBeVisible();
});
