// Runs the search indexing step (scripts/index-search.mjs) and prints its time and the peak
// memory of the larger of this process and Pagefind's indexing service (read from /proc while it runs).
import { readFileSync, readdirSync } from 'node:fs';

let peakChildKB = 0;
const poll = setInterval(() => {
  for (const pid of readdirSync('/proc').filter((d) => /^\d+$/.test(d))) {
    try {
      const status = readFileSync(`/proc/${pid}/status`, 'utf8');
      if (!/PPid:\s+(\d+)/.exec(status) || Number(/PPid:\s+(\d+)/.exec(status)[1]) !== process.pid) continue;
      const hwm = Number(/VmHWM:\s+(\d+)/.exec(status)?.[1] ?? 0);
      if (hwm > peakChildKB) peakChildKB = hwm;
    } catch { /* process ended */ }
  }
}, 50);
const t0 = performance.now();
/** CPU seconds (user + system) of this process (esbuild helpers excluded, in both builds): robust to a busy machine. */
const cpu = () => { const u = process.resourceUsage(); return (u.userCPUTime + u.systemCPUTime) / 1e6; };
await import(new URL('../../scripts/index-search.mjs', import.meta.url).href);
const seconds = (performance.now() - t0) / 1000;
clearInterval(poll);
process.stdout.write(`\n${JSON.stringify({ seconds, cpuSeconds: cpu(), maxRssKB: Math.max(process.resourceUsage().maxRSS, peakChildKB) })}\n`);
