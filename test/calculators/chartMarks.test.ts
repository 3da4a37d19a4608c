/**
 * The operating point on charts (src/calculators/chartMarks.ts) and the chart rules over every
 * registered calculator at its defaults: every chart whose x axis names an input gets exactly one
 * operating-point marker at that input's value, and the static SVG draws it; series of one chart
 * never share a palette slot beyond the eight available. Behaviour only (no reference values).
 */
import { describe, expect, it } from 'vitest';
import { withOperatingPoint } from '../../src/calculators/chartMarks.ts';
import { defaults, evaluate } from '../../src/calculators/evaluate.ts';
import { calculators } from '../../src/calculators/registry.ts';
import { svgChart } from '../../src/components/render/svgChart.ts';

describe('withOperatingPoint', () => {
  const calcs = calculators.filter((c) => c.charts);

  it('marks the current input value on every chart whose x axis is an input', () => {
    let marked = 0;
    for (const calc of calcs) {
      const r = evaluate(calc, defaults(calc));
      for (const spec of withOperatingPoint(calc, calc.charts!(r.values, r), r.values)) {
        const key = spec.x.input;
        if (!key) continue;
        expect(calc.inputs.some((i) => i.key === key), `${calc.id}/${spec.id}: x.input '${key}' is an input`).toBe(true);
        const v = r.values[key];
        if (typeof v !== 'number') continue;
        const ops = (spec.markers ?? []).filter((m) => m.operating);
        expect(ops, `${calc.id}/${spec.id}`).toHaveLength(1);
        expect(ops[0]!.x).toBe(v);
        if (v > 0 || spec.x.scale !== 'log') expect(svgChart(spec, 'SI'), `${calc.id}/${spec.id}`).toContain('svg-marker operating');
        marked++;
      }
    }
    expect(marked).toBeGreaterThanOrEqual(5);
  });

  it('adds the marker once, and says it in the summary', () => {
    const calc = calculators.find((c) => c.id === 'road-power')!;
    const r = evaluate(calc, defaults(calc));
    const once = withOperatingPoint(calc, calc.charts!(r.values, r), r.values);
    const twice = withOperatingPoint(calc, once, r.values);
    const power = twice.find((s) => s.id === 'power-speed')!;
    expect(power.markers!.filter((m) => m.operating)).toHaveLength(1);
    expect(power.summary).toMatch(/Marked: this case, vehicle speed/);
    expect(power.series[0]!.x.length).toBeGreaterThanOrEqual(60);
    expect(new Set(power.series.map((s) => s.tone)).size).toBe(power.series.length);
  });
});
