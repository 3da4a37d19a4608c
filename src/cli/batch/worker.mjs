// Worker-thread entry: a worker starts without the main thread's module hooks, so it registers
// tsx's loader exactly as bin/dampbook.mjs does and then runs the TypeScript worker source.
import { register } from 'tsx/esm/api';

register();
await import('./worker.ts');
