#!/usr/bin/env node
// The `barwright` command: runs the TypeScript sources through tsx, so no build step is needed.
import { register } from 'tsx/esm/api';

register();
const { runCli, nodeIo } = await import('../src/cli.ts');
process.exitCode = await runCli(process.argv.slice(2), nodeIo);
