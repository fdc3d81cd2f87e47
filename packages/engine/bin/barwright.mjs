#!/usr/bin/env node
// The `barwright` command: runs the TypeScript sources through tsx, so no build step is needed.
import { register } from 'tsx/esm/api';

register();
// A reader that stops early (`barwright profile f.json | head`) is not an error.
process.stdout.on('error', (error) => {
  if (error.code === 'EPIPE') process.exit(0);
  throw error;
});
const { runCli, nodeIo } = await import('../src/cli.ts');
process.exitCode = await runCli(process.argv.slice(2), nodeIo);
