/**
 * The operating point on charts whose x axis is a calculator input (`ChartAxis.input`): one
 * marker at the input's current value, added here once so the static SVG, the live chart, the
 * sheet and the text summary all show it without per-calculator UI code.
 */
import { q } from './quantityText.ts';
import type { CalculatorDefinition, ChartSpec, Values } from './types.ts';

/** The specs with an operating-point marker added where the x axis names an input holding a number. */
export function withOperatingPoint(calc: Pick<CalculatorDefinition, 'inputs'>, specs: readonly ChartSpec[], values: Values): ChartSpec[] {
  return specs.map((spec) => {
    const key = spec.x.input;
    if (!key) return spec;
    const v = values[key];
    const def = calc.inputs.find((i) => i.key === key);
    if (typeof v !== 'number' || !Number.isFinite(v) || !def) return spec;
    // already marked (a redraw of the same spec object): do not stack a second line
    if (spec.markers?.some((m) => m.operating)) return spec;
    return {
      ...spec,
      markers: [...(spec.markers ?? []), { x: v, label: def.label, operating: true }],
      // said in words too: print and screen readers get the marked value
      summary: `${spec.summary} Marked: this case, ${def.label.toLowerCase()} ${q(v, spec.x.kind, 3)}.`,
    };
  });
}
