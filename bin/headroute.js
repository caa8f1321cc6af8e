#!/usr/bin/env node
// The `headroute` command: registers tsx so Node can load the TypeScript sources, then runs
// src/cli/main.ts. See `headroute --help`.
import { register } from 'tsx/esm/api';

register();
const { main } = await import(new URL('../src/cli/main.ts', import.meta.url).href);
process.exitCode = await main(process.argv.slice(2));
