/**
 * The tools every calculator gets after it is live: tolerances with result ranges (vary-panel.ts)
 * and the sweep chart (sweep-panel.ts). One lazy chunk, loaded once the first result shows, so
 * the calculator's own first paint does not wait for it. `data-tools` says they are attached.
 */
import { attachSweep } from './sweep-panel.ts';
import { attachVary, type VaryHost } from './vary-panel.ts';

export function attachTools(host: VaryHost): void {
  attachVary(host);
  attachSweep(host);
  host.dataset.tools = '';
}
