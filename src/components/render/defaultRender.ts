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
import { defaults, evaluate } from '../../calculators/evaluate.ts';
import { withOperatingPoint } from '../../calculators/chartMarks.ts';
import type { CalculatorDefinition, ChartSpec, Result, Values } from '../../calculators/types.ts';
import type { UnitSystem } from '../../core/units/index.ts';
import { svgChart } from './svgChart.ts';

export interface DefaultChart {
  spec: ChartSpec;
  /** The static SVG markup ('' when the chart has nothing drawable). */
  svg: string;
}

export interface DefaultRender {
  result: Result & { values: Values };
  charts: readonly DefaultChart[];
}

const cache = new Map<string, { def: CalculatorDefinition; render: DefaultRender }>();

/** The calculator's default case with every chart drawn in `system`, computed on first use. */
export function defaultRender(calc: CalculatorDefinition, system: UnitSystem): DefaultRender {
  // keyed by the definition object too: two definitions may not share an id, but a test that
  // registers a stand-in under a real id must not read the real one's drawing
  const key = `${calc.id}\u0000${system}`;
  const hit = cache.get(key);
  if (hit && hit.def === calc) return hit.render;
  const result = evaluate(calc, defaults(calc));
  const specs = withOperatingPoint(calc, calc.charts?.(result.values, result) ?? [], result.values);
  const render: DefaultRender = { result, charts: specs.map((spec) => ({ spec, svg: svgChart(spec, system) })) };
  cache.set(key, { def: calc, render });
  return render;
}
