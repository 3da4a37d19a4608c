#!/usr/bin/env node
// Entry point of `npx dampbook`: runs the TypeScript CLI through tsx's loader (installed with the
// project), so the CLI and the site share the same sources with no separate build step.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../src/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
