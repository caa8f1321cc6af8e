import { defineConfig } from '@playwright/test';
import { findChromium } from './scripts/browser-path.js';

// E2E_PORT lets several people run the browser tests at once; E2E_DEV=1 serves with
// `vite dev` instead of the built app (faster while working, no shared build folder).
// The default port is not `npm start`'s 4173, so the tests can run while the app is served;
// `npm run test:browser` also builds into folders of its own (HEADROUTE_TEST_BUILD, see
// svelte.config.js).
const port = Number(process.env.E2E_PORT ?? 4183);
const server = process.env.E2E_DEV
  ? `npx vite dev --port ${port} --strictPort --host 127.0.0.1`
  : `npx vite preview --port ${port} --strictPort --host 127.0.0.1`;

export default defineConfig({
  testDir: 'e2e',
  timeout: 60_000,
  workers: 1,
  reporter: [['list']],
  outputDir: 'test-results',
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    viewport: { width: 1440, height: 900 },
    launchOptions: {
      executablePath: findChromium(),
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
  },
  webServer: {
    command: server,
    url: `http://127.0.0.1:${port}`,
    reuseExistingServer: false,
    timeout: 60_000,
  },
});
