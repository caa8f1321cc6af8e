import { test, expect, type Page } from '@playwright/test';
import { network } from '../bench/networks';
import { serializeProject } from '../src/lib/model/file/serialize';

// A large sheet is solved in the background worker. When the worker answers with an error, or
// dies, the app ends the solve (a finding, or a solve in the page): never "solving…" for ever.

test.use({ serviceWorkers: 'block' });

/** Open a sheet of about 600 elements (solved in the worker). */
async function openLarge(page: Page) {
  await page.goto('/');
  await expect(page.locator('g.node[data-kind="pump"]')).toBeVisible({ timeout: 30_000 });
  await page.locator('input[type="file"]').setInputFiles({
    name: 'large.headroute.json',
    mimeType: 'application/json',
    buffer: Buffer.from(serializeProject(network('series', 300))),
  });
  await expect(page.locator('.status-line .message')).toContainText('Opened', { timeout: 30_000 });
}

test('a worker that answers with an error ends in a finding, not "solving…"', async ({ page }) => {
  await page.route('**/worker-*.js', (route) =>
    route.fulfill({
      contentType: 'text/javascript',
      body: `self.onmessage = (e) => self.postMessage({ id: e.data.id, revision: e.data.revision, error: 'injected failure' });`,
    }),
  );
  await openLarge(page);
  const meta = page.locator('.status-line .meta');
  await expect(meta).toContainText('not converged', { timeout: 30_000 });
  await expect(meta).not.toContainText('solving');
  await expect(page.getByText('The solver failed (injected failure); no results.')).toBeVisible();
});

test('a worker that throws is replaced by a solve in the page', async ({ page }) => {
  await page.route('**/worker-*.js', (route) =>
    route.fulfill({
      contentType: 'text/javascript',
      body: `self.onmessage = () => { throw new Error('crash'); };`,
    }),
  );
  await openLarge(page);
  const meta = page.locator('.status-line .meta');
  await expect(meta).not.toContainText('solving', { timeout: 30_000 });
  await expect(meta).toContainText(/solved|not converged/);
});
