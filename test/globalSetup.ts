/**
 * Before any test: build the `headroute` bundle (dist/cli/headroute.mjs) from the sources as
 * they are, so the tests that run the installed command never run a stale build.
 */
import { execFileSync } from 'node:child_process';

export default function setup(): void {
  execFileSync(process.execPath, ['scripts/build-cli.js'], { stdio: 'inherit' });
}
