// Finds a Chromium for the browser tests: CHROMIUM_PATH, then Debian's /usr/bin/chromium,
// then Playwright's own install. Never downloads anything.
import { existsSync } from 'node:fs';
import { chromium } from '@playwright/test';

/** @returns {string | undefined} the path of a Chromium executable, or undefined when none is found */
export function findChromium() {
  const candidates = [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'];
  for (const c of candidates) if (c && existsSync(c)) return c;
  try {
    const own = chromium.executablePath();
    if (own && existsSync(own)) return own;
  } catch {
    /* no Playwright browser installed */
  }
  return undefined;
}
