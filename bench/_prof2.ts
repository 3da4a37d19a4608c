import { serveStatic } from '../src/server/staticServer.ts';
import { launch } from '../test/helpers/browser.ts';
const served = await serveStatic('.test-out/root', '/');
const browser = await launch();
const page = await (await browser.newContext()).newPage();
const cdp = await page.context().newCDPSession(page);
await cdp.send('Profiler.enable'); await cdp.send('Profiler.setSamplingInterval', { interval: 100 });
await cdp.send('Profiler.start');
await page.goto(`${served.url}duty/road-power/?study=tw-210-rear-damper-class-d`);
await page.waitForSelector('db-calculator[data-calc="road-power"][data-study]');
const { profile } = await cdp.send('Profiler.stop') as any;
const self = new Map<string, number>(); const byUrl = new Map<string, number>();
const dt = new Map<number, number>();
profile.samples.forEach((id: number, i: number) => dt.set(id, (dt.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0)));
for (const n of profile.nodes) {
  const t = (dt.get(n.id) ?? 0) / 1000; const f = n.callFrame;
  const k = `${f.functionName || '(anon)'} ${f.url.split('/').pop()}:${f.lineNumber}`;
  self.set(k, (self.get(k) ?? 0) + t); const u = f.url.split('/').pop() || f.functionName; byUrl.set(u, (byUrl.get(u) ?? 0) + t);
}
console.log([...byUrl].sort((a, b) => b[1] - a[1]).slice(0, 15).map(([k, v]) => `${v.toFixed(1)} ${k}`).join('\n'));
console.log('---');
console.log([...self].sort((a, b) => b[1] - a[1]).slice(0, 25).map(([k, v]) => `${v.toFixed(1)} ${k}`).join('\n'));
await browser.close(); await served.close();
