/**
 * Arrhenius and halving-interval life, the temperature-history reader and the Miner sum over a
 * history, against worked closed forms and an independent quadrature (mpmath).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ageingLife, halvingInterval, historyAgeing, readTemperatureHistory, temperatureForLife, type AgeingLaw } from '../../../src/core/ageing/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const H = 3600;
const LAW: AgeingLaw = { kind: 'arrhenius', Lref: 1000 * H, Tref: 373.15, Ea: 82.4e3 };

describe('ageing law', () => {
  it('Arrhenius: 82.4 kJ/mol ages 4.5 times slower 20 K below 100 °C and twice as fast 10 K above', () => {
    // L = L_ref·exp[(E_a/R)(1/T − 1/T_ref)], ISO 11346:2014 Arrhenius approach (from memory); worked by hand: E_a/R = 9910.44 K
    expectClose({ label: 'L(80 °C)', computed: ageingLife(LAW, 353.15) / H, expected: 4500.1587, tol: 1e-7, why: 'closed form, 8 s.f.' });
    expectClose({ label: 'L(110 °C)', computed: ageingLife(LAW, 383.15) / H, expected: 499.98780, tol: 1e-7, why: 'closed form, 8 s.f.' });
  });
  it('halving law: 30 K above the reference is an eighth of the life (closed form)', () => {
    const halving: AgeingLaw = { kind: 'halving', Lref: 1000, Tref: 373.15, dTh: 10 };
    expectClose({ label: 'L', computed: ageingLife(halving, 403.15), expected: 125, tol: 1e-12, why: '2^-3 exactly' });
  });
  it('the equivalent halving interval of 82.4 kJ/mol at 100 °C is 9.74 K (R T² ln2 / E_a, closed form)', () => {
    expectClose({ label: 'ΔT_h', computed: halvingInterval(82.4e3, 373.15), expected: 9.738663, tol: 1e-6, why: 'closed form, 7 s.f.' });
  });
  it('temperatureForLife inverts ageingLife (property)', () => {
    fc.assert(fc.property(fc.double({ min: 250, max: 600, noNaN: true }), fc.double({ min: 20e3, max: 200e3, noNaN: true }), (T, Ea) => {
      const law: AgeingLaw = { ...LAW, Ea };
      return Math.abs(temperatureForLife(law, ageingLife(law, T))! - T) < 1e-8 * T;
    }), { seed: 1, numRuns: 200 });
  });
});

describe('temperature history', () => {
  it('reads hours and °C from the header, a step as two rows at one time', () => {
    const h = readTemperatureHistory('# test\nt [h], T [°C]\n0, 80\n450, 80\n450, 110\n900, 110');
    expect(h.t).toEqual([0, 450 * H, 450 * H, 900 * H]);
    expect(h.T[2]).toBeCloseTo(383.15, 10);
  });
  it('names the line of a bad row', () => {
    expect(() => readTemperatureHistory('0, 300\n10, 310\n5, 320')).toThrow(/line 3: times must not go back/);
    expect(() => readTemperatureHistory('0, 300\n10, 310\n10, 320\n10, 330')).toThrow(/line 4/);
    expect(() => readTemperatureHistory('0, 80\n10, 90')).toThrow(InputRangeError); // 80 K without a unit header
    expect(() => readTemperatureHistory('0, 300')).toThrow(/at least two rows/);
  });
});

describe('historyAgeing', () => {
  it('half the time at 80 °C and half at 110 °C: 900 h life, equivalent 101.49 °C', () => {
    // Miner sum (Miner 1945) of the Arrhenius lives: 1/(0.5/4500 + 0.5/500) = 900 h, worked by hand; closed form
    const r = historyAgeing(LAW, readTemperatureHistory('t [h], T [°C]\n0, 80\n450, 80\n450, 110\n900, 110'));
    expectClose({ label: 'life', computed: r.life / H, expected: 899.98341, tol: 1e-7, why: 'closed form, 8 s.f. (the issue rounds to 900 h)' });
    expectClose({ label: 'damage', computed: r.damage, expected: 1.0000184, tol: 1e-6, why: 'the history lasts 900 h' });
    expectClose({ label: 'Teq', computed: r.Teq, expected: 374.636464, tol: 1e-9, why: '1/T_eq = 1/T_ref + (R/E_a) ln(L/L_ref), closed form' });
  });
  it('a ramp 20 → 120 °C in 10 h: damage 5.593561e-3 (mpmath quadrature)', () => {
    // reference library mpmath@1.3.0 quad at 30 digits of ∫ dt / L(T(t)) with the same law
    const r = historyAgeing(LAW, { t: [0, 10 * H], T: [293.15, 393.15] });
    expectClose({ label: 'damage', computed: r.damage, expected: 0.00559356082081887, tol: 1e-10, why: 'Gauss panels with ln-rate steps ≤ 0.25: error far below 1e-10' });
    expectClose({ label: 'Teq', computed: r.Teq, expected: 365.162163660976, tol: 1e-10, why: 'same integral' });
  });
  it('a constant history at T_ref uses its own length over L_ref (closed form)', () => {
    const r = historyAgeing(LAW, { t: [0, 100 * H], T: [373.15, 373.15] });
    expectClose({ label: 'damage', computed: r.damage, expected: 0.1, tol: 1e-12, why: 'exact: one level segment' });
    expectClose({ label: 'Teq', computed: r.Teq, expected: 373.15, tol: 1e-12, why: 'exact' });
  });
  it('the equivalent temperature lies between the coldest and hottest points (property)', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: 250, max: 450, noNaN: true }), { minLength: 2, maxLength: 12 }), (Ts) => {
      const r = historyAgeing(LAW, { t: Ts.map((_, i) => i * 600), T: Ts });
      return r.Teq >= Math.min(...Ts) - 1e-9 && r.Teq <= Math.max(...Ts) + 1e-9;
    }), { seed: 1, numRuns: 200 });
  });
});
