import { DampbookError } from '../../core/errors.ts';
import { bodyCooling, dutyPower, fadeCoefficient, fadeEquilibrium, fadeLogSlope, fadeRatio, oilAtBody, oilDensity, type Body, type FadeDuty, type FadeModel, type OilNode } from '../../core/thermal/index.ts';
import { choice, defineCalculator, num, type ChartSpec, type Values } from '../types.ts';
import { bodyFrom, bodyInputs } from '../shared/bodyInputs.ts';
import { betaFrom, FLUID_SOURCES, fluidFrom, fluidInputs, lawInputs, spanWarning } from '../shared/fluidInputs.ts';
import { q } from '../quantityText.ts';
import { DAMPING_FADE_CASES } from './damping-fade.cases.ts';
import { ZERO_CELSIUS } from '../../core/constants.ts';
import { HEAT_PATH_STUDY, heatPathInputs, withHeatPaths } from '../shared/heatPathInputs.ts';
import { OIL_NODE_STUDY, oilBodyNote, oilNodeInputs, twoNodes } from '../shared/oilNodeInputs.ts';

/** Highest temperature searched for the equilibrium the body would reach if nothing failed at the limit (K). */
const SEARCH_T_MAX = ZERO_CELSIUS + 400; // 673.15 K, the top of the temperature inputs

function setup(values: Values) {
  const body = withHeatPaths(bodyFrom(values), values);
  const fluid = fluidFrom(values);
  const model: FadeModel = {
    cRef: num(values, 'cRef'), Tref: num(values, 'Tref'), viscousShare: num(values, 'share'),
    oil: fluid.curve, beta: betaFrom(values),
  };
  const duty: FadeDuty = choice(values, 'duty') === 'harmonic'
    ? { kind: 'harmonic', X: num(values, 'X'), omega: 2 * Math.PI * num(values, 'f') }
    : { kind: 'random', P: num(values, 'P') };
  const oil: OilNode | undefined = twoNodes(values) ? { Gob: num(values, 'Gob'), Coil: num(values, 'Coil') } : undefined;
  return { body, model, duty, fluid, oil, Tlimit: num(values, 'Tlimit') };
}

/** Damping fade and the coupled thermal equilibrium of a damper. */
export const dampingFadeCalculator = defineCalculator({
  id: 'damping-fade',
  offMainThread: true, // p99 of evaluate + charts over a frame (npm run bench)
  title: 'Damping fade and thermal equilibrium',
  summary: 'How the damping coefficient falls as the oil heats, and the body temperature and coefficient at which the heat the damper makes equals the heat it sheds — or the time until it passes its limit.',
  inputs: [
    { key: 'cRef', label: 'Damping coefficient at T_ref', kind: 'damping', default: 980, min: 0, max: 1e7, minExclusive: true, required: true, help: 'Linear coefficient measured or specified at the reference temperature.' },
    { key: 'Tref', label: 'Reference temperature T_ref', kind: 'temperature', default: 298.15, min: 233.15, max: 423.15, help: 'Temperature at which c_ref holds (dyno tests are often at 20–25 °C).' },
    { key: 'share', label: 'Viscous share s at T_ref', kind: 'fraction', default: 0.3, min: 0, max: 1, help: 'Part of c_ref that follows oil viscosity (bleed, laminar, leakage flow); the rest (valves, orifices) does not. Fit it to dyno tests at several temperatures on the fade-fit page; 0.3 is a guess that overstates cold forces for many twin-tube dampers.' },
    ...lawInputs(),
    { key: 'rho15', label: 'Fluid density at 15 °C ρ15', kind: 'density', default: 870, min: 600, max: 1200, help: 'From the data sheet (mineral damper oils 850–890 kg/m³, silicone fluids about 960). Only sets the reported dynamic viscosity: the force ratios depend on β alone.', when: { key: 'fadeLaw', is: ['physical'] } },
    ...fluidInputs(),
    { key: 'Tcold', label: 'Cold-start temperature', kind: 'temperature', default: 253.15, min: 213.15, max: 313.15, help: 'For the cold-force ratio c(T_cold)/c_ref (mount and structure loads at a cold start).' },
    { key: 'duty', label: 'Duty', kind: 'choice', default: 'harmonic', options: [{ value: 'harmonic', label: 'harmonic stroke (P = ½cω²X²)' }, { value: 'random', label: 'random road (P fixed, independent of c)' }], help: 'What sets the power.' },
    { key: 'X', label: 'Stroke amplitude X', kind: 'length', default: 0.02, min: 0, max: 0.5, help: 'Half the peak-to-peak damper stroke.', when: { key: 'duty', is: ['harmonic'] } },
    { key: 'f', label: 'Stroke frequency f', kind: 'frequency', default: 1.5, min: 0, max: 100, help: 'Cycles per second.', when: { key: 'duty', is: ['harmonic'] } },
    { key: 'P', label: 'Mean damper power P', kind: 'power', default: 40, min: 0, max: 20000, help: 'From the random-road duty page.', when: { key: 'duty', is: ['random'] } },
    { key: 'Tlimit', label: 'Temperature limit', kind: 'temperature', default: 373.15, min: 243.15, max: 673.15, help: 'Oil or seal limit; the search for an equilibrium stops here.' },
    { key: 'Cth', label: 'Heat capacity C', kind: 'heatCapacity', default: 1395, min: 0, max: 1e7, minExclusive: true, help: 'Σ m·c, for the time to the limit when no equilibrium exists.' },
    ...bodyInputs(),
    ...heatPathInputs(),
    ...oilNodeInputs(true),
  ],
  outputs: [
    { key: 'status', label: 'Result', kind: 'text' },
    { key: 'Teq', label: 'Equilibrium body temperature', kind: 'temperature', optional: true, feeds: [{ page: 'gas-charge', input: 'T', label: 'Gas pressure at this equilibrium' }] },
    { key: 'ToilEq', label: 'Equilibrium oil temperature', kind: 'temperature', optional: true, help: 'The body temperature with one node; + P/G_ob with two. The coefficient is taken at this temperature.' },
    { key: 'cEq', label: 'Damping coefficient at equilibrium', kind: 'damping', optional: true },
    { key: 'Peq', label: 'Damper power at equilibrium', kind: 'power', optional: true },
    { key: 'fade', label: 'Coefficient lost to fade', kind: 'fraction', optional: true, help: '1 − c_eq/c_ref (or at the limit when no equilibrium).' },
    { key: 'crossings', label: 'Equilibria below the limit', kind: 'dimensionless', digits: 1 },
    { key: 'tLimit', label: 'Time to the limit from ambient', kind: 'time', optional: true, help: 'Only when no equilibrium exists below the limit.' },
    { key: 'cLimit', label: 'Damping coefficient at the limit', kind: 'damping' },
    { key: 'Tactual', label: 'Equilibrium temperature, even above the limit', kind: 'temperature', optional: true, help: 'Where the body would settle if nothing failed at the limit (searched to 400 °C): how far past the limit the duty drives it.' },
    { key: 'cActual', label: 'Damping coefficient at that equilibrium', kind: 'damping', optional: true },
    { key: 'coldRatio', label: 'Cold-force ratio c(T_cold)/c_ref', kind: 'dimensionless' },
    { key: 'dcdT', label: 'Fade rate at T_ref, (1/c)·dc/dT', kind: 'perTemperature' },
    { key: 'nu100Used', label: 'ν100 of the grade (ASTM D2270)', kind: 'kinematicViscosity', optional: true, help: 'The 100 °C viscosity an oil of this grade and viscosity index has.' },
    { key: 'muRef', label: 'Dynamic viscosity at T_ref', kind: 'dynamicViscosity', optional: true, help: 'μ = ρ·ν of the fluid at T_ref (physical law).' },
  ],
  compute(values) {
    const { body, model, duty, fluid, oil, Tlimit } = setup(values);
    const warnings: string[] = [];
    const Tcold = num(values, 'Tcold');
    const common = {
      coldRatio: fadeRatio(model, Tcold),
      dcdT: fadeLogSlope(model, model.Tref),
      nu100Used: choice(values, 'fluid') === 'vg' ? fluid.nu100 : undefined,
      muRef: choice(values, 'fadeLaw') === 'physical' ? oilDensity(num(values, 'rho15'), model.beta ?? 0, model.Tref) * fluid.curve.nu(model.Tref) : undefined,
    };
    for (const w of [spanWarning(fluid, Tcold, 'cold-start temperature'), spanWarning(fluid, Tlimit, 'limit'), spanWarning(fluid, body.Tamb, 'air temperature')]) if (w) warnings.push(w);
    if (Tlimit <= body.Tamb + 1) {
      return { outputs: { status: 'limit not above the air temperature', crossings: 0, cLimit: fadeCoefficient(model, Tlimit), ...common }, warnings: [...warnings, 'The limit must be above the air temperature.'] };
    }
    const eq = fadeEquilibrium(body, model, duty, Tlimit, num(values, 'Cth'), oil);
    warnings.push(...eq.warnings, ...bodyCooling(body, Tlimit).warnings);
    if (duty.kind === 'random') warnings.push('Random road: the damper power does not depend on c, so fade changes the ride, not the temperature.');
    const cLimit = fadeCoefficient(model, Tlimit);
    if (eq.reached) {
      const note = oilBodyNote(eq.reached.Toil, eq.reached.T);
      if (note) warnings.push(note);
      return {
        outputs: { status: 'equilibrium below the limit', Teq: eq.reached.T, ToilEq: eq.reached.Toil, cEq: eq.reached.c, Peq: eq.reached.P, fade: 1 - eq.reached.c / model.cRef, crossings: eq.crossings.length, cLimit, Tactual: eq.reached.T, cActual: eq.reached.c, ...common },
        warnings,
      };
    }
    const beyond = equilibriumAbove(body, model, duty, Tlimit, oil);
    if (beyond) warnings.push(`Past the limit the body would settle at ${(beyond.T - ZERO_CELSIUS).toFixed(0)} °C with c = ${beyond.c.toFixed(0)} N·s/m, if the oil and seals survived that.`);
    else warnings.push(`No equilibrium below ${(SEARCH_T_MAX - ZERO_CELSIUS).toFixed(0)} °C either: the duty overwhelms the body.`);
    return { outputs: { status: 'no equilibrium below the limit', crossings: 0, tLimit: eq.tLimit, fade: 1 - cLimit / model.cRef, cLimit, Tactual: beyond?.T, cActual: beyond?.c, ...common }, warnings };
  },
  charts(values, result): ChartSpec[] {
    const { body, model, duty, oil, Tlimit } = setup(values);
    const lo = body.Tamb;
    const hi = Math.min(673.15, Math.max(Tlimit, lo + 10) + 20);
    const T = Array.from({ length: 61 }, (_, i) => lo + ((hi - lo) * i) / 60);
    const Q = T.map((t) => bodyCooling(body, t).Q);
    const P = T.map((t, i) => dutyPower(duty, fadeCoefficient(model, oilAtBody(Q[i]!, t, oil))));
    const c = T.map((t) => fadeCoefficient(model, t));
    const Teq = result.outputs.Teq as number | undefined;
    const markers = [{ x: Tlimit, label: 'limit' }, ...(Teq !== undefined ? [{ x: Teq, label: 'equilibrium' }] : [])];
    const what = Teq !== undefined ? `They cross at ${(Teq - ZERO_CELSIUS).toFixed(1)} °C, where c = ${(result.outputs.cEq as number).toFixed(0)} N·s/m.` : `They do not cross below the ${(Tlimit - ZERO_CELSIUS).toFixed(0)} °C limit.`;
    return [
      {
        id: 'equilibrium',
        title: 'Heat rejected and damper power against body temperature',
        x: { label: 'Body temperature', kind: 'temperature' },
        y: { label: 'Power', kind: 'power', ...(body.Qsun === undefined ? { min: 0 } : {}) },
        series: [
          { label: 'heat rejected Q(T)', x: T, y: Q, tone: 0 },
          { label: oil ? 'damper power P(c(T_oil)), oil in equilibrium with the body' : 'damper power P(c(T))', x: T, y: P, style: 'dash', tone: 3 },
        ],
        markers,
        summary: `Heat rejected rises from 0 to ${q(Q.at(-1)!, 'power', 3)} over the range; damper power goes from ${q(P[0]!, 'power', 3)} to ${q(P.at(-1)!, 'power', 3)}. ${what}`,
      },
      {
        id: 'fade',
        title: 'Damping coefficient against oil temperature',
        x: { label: 'Oil temperature', kind: 'temperature' },
        y: { label: 'Damping coefficient', kind: 'damping', min: 0 },
        series: [{ label: 'c(T)', x: T, y: c, tone: 1 }],
        markers,
        summary: `The coefficient falls from ${q(c[0]!, 'damping')} at ${q(lo, 'temperature', 3)} to ${q(c.at(-1)!, 'damping')} at ${q(hi, 'temperature', 3)} (viscous share ${num(values, 'share')}).`,
      },
    ];
  },
  verification: DAMPING_FADE_CASES,
  sources: [
    { key: 'incropera2007', locator: 'eqs. 9.34, 7.54, 9.64, 1.9 (from memory)' },
    { key: 'brent1973', locator: 'ch. 4 (root refinement)' },
    ...FLUID_SOURCES,
  ],
  study: {
    inputs: { cRef: 'dampingCoefficient', Tref: 'referenceTemperature', share: 'fadeShare', fadeLaw: 'fadeLaw', beta: 'oilExpansion', fluid: 'damperFluid', nu40: 'oilViscosity40', nu100: 'oilViscosity100', X: 'strokeAmplitude', f: 'strokeFrequency', P: 'meanPower', Tlimit: 'allowedTemperature', Cth: 'heatCapacity', D: 'bodyDiameter', L: 'bodyLength', orientation: 'bodyOrientation', eps: 'bodyEmissivity', flowFactor: 'localFlowFactor', Tamb: 'airTemperature', dTsur: 'surroundingsAboveAir', V: 'vehicleSpeed', ...HEAT_PATH_STUDY, ...OIL_NODE_STUDY, Coil: 'oilHeatCapacity' },
    publishes: { ToilEq: 'oilTemperature' },
  },
});

/** The equilibrium the body would reach above the limit (searched from the limit to SEARCH_T_MAX), if any. */
function equilibriumAbove(body: Body, model: FadeModel, duty: FadeDuty, Tlimit: number, oil: OilNode | undefined): { T: number; c: number } | undefined {
  if (Tlimit >= SEARCH_T_MAX - 1) return undefined;
  try {
    const eq = fadeEquilibrium(body, model, duty, SEARCH_T_MAX, undefined, oil && { Gob: oil.Gob });
    const hit = eq.crossings.find((x) => x.Toil >= Tlimit && x.stable) ?? eq.crossings.find((x) => x.Toil >= Tlimit);
    return hit && { T: hit.T, c: hit.c };
  } catch (e) {
    // a viscosity law or a correlation that gives out far above the limit: no answer, not a wrong one
    if (e instanceof DampbookError) return undefined;
    throw e;
  }
}
