import { test, expect, type Page } from '@playwright/test';

// Autosave: the last edit survives a reload, tabs keep their own copies, an unreadable copy is
// kept and can be exported, and a failing autosave says so and offers to save the file.

async function open(page: Page) {
  await page.goto('/');
  await expect(page.locator('g.node[data-kind="pump"]')).toBeVisible({ timeout: 30_000 });
}

/** Add a junction from the shelf (one committed edit). */
async function addJunction(page: Page) {
  const before = await page.locator('g.node').count();
  await page.locator('[data-part="junction"]').focus();
  await page.keyboard.press('Enter');
  await expect(page.locator('g.node')).toHaveCount(before + 1);
  return before + 1;
}

for (const delay of [0, 100, 300]) {
  test(`an edit survives a reload ${delay} ms after it`, async ({ page }) => {
    await open(page);
    const count = await addJunction(page);
    if (delay) await page.waitForTimeout(delay);
    await page.reload();
    await expect(page.locator('g.node[data-kind="junction"]')).toHaveCount(1, { timeout: 30_000 });
    await expect(page.locator('g.node')).toHaveCount(count);
    await expect(page.locator('.notice').filter({ hasText: 'Restored' })).toBeVisible();
  });
}

test('a restored project equal to its file is not unsaved; an edited one is', async ({ page }) => {
  await open(page);
  await page.reload();
  await expect(page.locator('.notice').filter({ hasText: 'Restored' })).toBeVisible({
    timeout: 30_000,
  });
  await expect(page.locator('.unsaved')).toHaveCount(0);
  await addJunction(page);
  await page.reload();
  await expect(page.locator('g.node[data-kind="junction"]')).toHaveCount(1, { timeout: 30_000 });
  await expect(page.locator('.unsaved')).toHaveCount(1);
});

test('two tabs keep their own autosaves; a new tab takes the closed one’s', async ({ context }) => {
  const a = await context.newPage();
  await open(a);
  const countA = await addJunction(a);
  const b = await context.newPage();
  await open(b);
  await expect(b.locator('[data-notice="other-tabs"]')).toBeVisible();
  await expect(b.locator('g.node[data-kind="junction"]')).toHaveCount(0);
  await b.getByLabel('Project name').fill('Work in tab B');
  await b.getByLabel('Project name').press('Enter');
  await b.waitForTimeout(1500); // B's IndexedDB copy too
  await a.reload();
  await expect(a.locator('g.node[data-kind="junction"]')).toHaveCount(1, { timeout: 30_000 });
  await expect(a.locator('g.node')).toHaveCount(countA);
  await expect(a.getByLabel('Project name')).not.toHaveValue('Work in tab B');
  await b.close();
  const c = await context.newPage();
  await open(c);
  await expect(c.getByLabel('Project name')).toHaveValue('Work in tab B');
  await expect(c.locator('.notice').filter({ hasText: 'Restored' })).toBeVisible();
});

test('an unreadable autosave is kept, not written over, and can be exported', async ({ page }) => {
  await open(page);
  const stored = await page.evaluate(async () => {
    const tabId = sessionStorage.getItem('headroute.tabId');
    const text = JSON.stringify({ format: 'headroute', version: 999, name: 'From the future' });
    const record = { savedAt: '2999-01-01T00:00:00.000Z', name: 'From the future', text };
    await new Promise<void>((resolve, reject) => {
      const req = indexedDB.open('headroute');
      req.onsuccess = () => {
        const tx = req.result.transaction('autosave', 'readwrite');
        tx.objectStore('autosave').put(record, `tab:${tabId}`);
        tx.oncomplete = () => resolve();
        tx.onerror = () => reject(tx.error);
      };
      req.onerror = () => reject(req.error);
    });
    return text;
  });
  await page.reload();
  const notice = page.locator('[data-notice="unreadable"]');
  await expect(notice).toContainText('could not be read', { timeout: 30_000 });
  await expect(notice).toContainText('From the future');
  // Later edits and saves go elsewhere: after an edit and a reload the copy is still there.
  await addJunction(page);
  await page.waitForTimeout(1500);
  await page.reload();
  await expect(notice).toBeVisible({ timeout: 30_000 });
  await expect(page.locator('g.node[data-kind="junction"]')).toHaveCount(1);
  const download = page.waitForEvent('download');
  await notice.getByRole('button', { name: 'Export it' }).click();
  const file = await download;
  const { readFile } = await import('node:fs/promises');
  expect(await readFile((await file.path())!, 'utf8')).toBe(stored);
});

test('a failing autosave is shown and offers to save the file', async ({ page }) => {
  await page.addInitScript(() => {
    IDBObjectStore.prototype.put = function () {
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    };
  });
  await open(page);
  await addJunction(page);
  const notice = page.locator('[data-notice="autosave-failed"]');
  await expect(notice).toContainText('storage for this page is full', { timeout: 5000 });
  const download = page.waitForEvent('download');
  await notice.getByRole('button', { name: 'Save to a file' }).click();
  expect((await download).suggestedFilename()).toMatch(/\.headroute\.json$/);
  await expect(page.locator('.unsaved')).toHaveCount(0);
});
