#!/usr/bin/env node
// Thin launcher: the compiled CLI lives in dist/ (built by `npm run build`, run by `npm ci`'s prepare step).
import { main } from '../dist/cli/main.js';

// A reader that stops early (`starclock … | head`) closes the pipe: stop quietly, as Unix tools do.
process.stdout.on('error', (error) => {
  if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw error;
});

process.exitCode = await main(process.argv.slice(2));
