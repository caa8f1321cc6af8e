// Fails early, with instructions, when no Chromium is available for the browser tests.
import { findChromium } from './browser-path.js';

const path = findChromium();
if (!path) {
  console.error(
    [
      'No Chromium found for the browser tests.',
      'Install one and run again, for example on Debian:',
      '  apt-get update && apt-get install -y chromium',
      'or point CHROMIUM_PATH at a Chromium executable.',
    ].join('\n'),
  );
  process.exit(1);
}
console.log(`Browser tests will use ${path}`);
