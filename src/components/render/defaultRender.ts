/**
 * The server's drawing of a calculator at its defaults (results, chart specs with the operating
 * point, static SVG), made once per calculator and unit system for the whole build.
 *
 * Why: every page that places a calculator shows the same default case, so a handbook with the
 * same calculator on 100 pages evaluated it and drew its SVG charts 100 times (about 0.2 s of
 * the static-generation phase on the 100-page build bench). `evaluate` is a pure function of the
 * definition and the inputs, so a cached drawing cannot go stale within one process; in `astro
 * dev` an edited definition reloads this module with it (it is in the module's import graph).
 *
 * The cached objects are shared between pages: callers read them and never change them.
 */
import { defaults } from '../../calculators/evaluate.ts';
import { computeForPage, type PageResult } from '../../calculators/pageCompute.ts';
import type { CalculatorDefinition, ChartSpec } from '../../calculators/types.ts';
import type { UnitSystem } from '../../core/units/index.ts';
import { svgChart } from './svgChart.ts';

export interface DefaultChart {
  spec: ChartSpec;
  /** The static SVG markup ('' when the chart has nothing drawable). */
  svg: string;
}

export interface DefaultRender {
  result: PageResult;
  charts: readonly DefaultChart[];
}

// keyed by the definition object: a test that registers a stand-in under a real id gets its own drawing
const cache = new WeakMap<CalculatorDefinition, Map<UnitSystem, DefaultRender>>();

/**
 * The calculator's default case with every chart drawn in `system`, computed on first use, by the
 * same function the live page uses (computeForPage: result, charts, operating point). The defaults
 * of a built-in calculator always compute and draw; when they do not, the build stops naming it.
 */
export function defaultRender(calc: CalculatorDefinition, system: UnitSystem): DefaultRender {
  let bySystem = cache.get(calc);
  if (!bySystem) cache.set(calc, (bySystem = new Map()));
  const hit = bySystem.get(system);
  if (hit) return hit;
  const page = computeForPage(calc, defaults(calc), true);
  if (!page.ok) throw new Error(`calculator ${calc.id}: its default inputs do not compute: ${page.message}`);
  if (page.chartError !== undefined) throw new Error(`calculator ${calc.id}: its charts at the default inputs cannot be drawn: ${page.chartError}`);
  const render: DefaultRender = { result: page.result, charts: (page.charts ?? []).map((spec) => ({ spec, svg: svgChart(spec, system) })) };
  bySystem.set(system, render);
  return render;
}
