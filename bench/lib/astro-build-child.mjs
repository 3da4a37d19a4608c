// Runs one `astro build` in this process and prints, as the last stdout line, this process's
// peak resident memory (getrusage maxrss: exact, no polling), and for a Dampbook build what its
// search index took after the last page (src/build/search-index.ts). Used by bench/build-scaling.ts.
import { build } from 'astro';

const root = process.argv[2] ?? '.';
const t0 = performance.now();
/** CPU seconds (user + system) of this process (esbuild helpers excluded, in both builds): robust to a busy machine. */
const cpu = () => { const u = process.resourceUsage(); return (u.userCPUTime + u.systemCPUTime) / 1e6; };
await build({ root, logLevel: 'error' });
const seconds = (performance.now() - t0) / 1000;
// the stats slot of src/build/search-feed-key.ts (SEARCH_STATS; this plain .mjs cannot import the .ts)
const search = globalThis[Symbol.for('dampbook:search-stats')];
process.stdout.write(`\n${JSON.stringify({ seconds, cpuSeconds: cpu(), maxRssKB: process.resourceUsage().maxRSS, searchIndexSeconds: search?.seconds ?? 0 })}\n`);
