#!/usr/bin/env node
// The `headroute` command. Runs the bundled build (dist/cli/headroute.mjs, made by
// `npm run build:cli`, which `npm install` / `npm ci` run through `prepare`), so it starts like
// a plain node script. HEADROUTE_TSX=1 runs the TypeScript sources through tsx instead (a
// development dependency), as does a checkout whose bundle has not been built yet.
const bundle = new URL('../dist/cli/headroute.mjs', import.meta.url);
const { existsSync } = await import('node:fs');

let entry;
if (process.env.HEADROUTE_TSX !== '1' && existsSync(bundle)) {
  entry = await import(bundle.href);
} else {
  const { register } = await import('tsx/esm/api');
  register();
  entry = await import(new URL('../src/cli/main.ts', import.meta.url).href);
}
process.exitCode = await entry.main(process.argv.slice(2));
