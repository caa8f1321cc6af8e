// Bundles the `headroute` command (src/cli/main.ts and the core modules it imports) into one
// plain ES module, dist/cli/headroute.mjs, so the command starts like a plain node script
// instead of compiling TypeScript at every start. Run by `npm run build:cli`, by `prepare`
// (so `npm ci` / `npm install` leave a working command) and before the unit tests.
import { build } from 'esbuild';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));

await build({
  absWorkingDir: root,
  entryPoints: ['src/cli/main.ts'],
  outfile: 'dist/cli/headroute.mjs',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  // One file, no source maps: an internal error prints the bundle's line; `HEADROUTE_TSX=1`
  // runs the TypeScript sources instead (bin/headroute.js).
  minifySyntax: true,
  legalComments: 'none',
  logLevel: 'warning',
});
