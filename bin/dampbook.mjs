#!/usr/bin/env node
// Entry point of `npx dampbook`: runs the TypeScript CLI through tsx's loader (installed with the
// project), so the CLI and the site share the same sources with no separate build step.
import { register } from 'tsx/esm/api';

register();
// a reader that stops early (`dampbook calc … | head`) closes the pipe: end quietly, no stack trace
process.stdout.on('error', (e) => { if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0); throw e; });
const { main } = await import('../src/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
