import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deratedEnergyPerHour, equivalentImpact, resetShare, stopEnergy, STANDARD_GRAVITY } from '../../../src/core/duty/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('end-stop load cases (calculator impact)', () => {
  it('rotary arm: I = 5 kg·m², ω = 2 rad/s, R = 0.5 m, M = 20 N·m, 25 mm → 11 J, 1 m/s, 22 kg [meriam2012 §6/6 work–energy, T = ½Iω² and work Mθ with θ = s/R (section from memory); closed form]', () => {
    const r = stopEnergy(equivalentImpact({ kind: 'rotary', I: 5, omega: 2, R: 0.5, M: 20 }), 0.025, 1, 60);
    expectClose({ label: 'E', computed: r.E, expected: 11, tol: 1e-12, why: '10 J kinetic + 1 J torque work, same arithmetic' });
    expectClose({ label: 'me', computed: r.me, expected: 22, tol: 1e-12 });
    expectClose({ label: 'v', computed: equivalentImpact({ kind: 'rotary', I: 5, omega: 2, R: 0.5, M: 20 }).v, expected: 1, tol: 1e-15 });
  });
  it('free fall: 10 kg from 0.2 m onto a 50 mm stop → 1.981 m/s, 24.5 J, 12.5 kg [meriam2012 §3/6–3/7 work–energy with gravity (sections from memory); closed form]', () => {
    const eq = equivalentImpact({ kind: 'freefall', m: 10, h: 0.2 });
    const r = stopEnergy(eq, 0.05, 1, 0);
    expectClose({ label: 'v', computed: eq.v, expected: 1.981, tol: 3e-4, why: 'check value given to 4 s.f.' });
    expectClose({ label: 'E', computed: r.E, expected: 24.5, tol: 1e-3, why: 'check value given to 3 s.f. (24.517 J with g = 9.80665 m/s²)' });
    expectClose({ label: 'me', computed: r.me, expected: 12.5, tol: 1e-12, why: 'm(h + s)/h exactly' });
  });
  it('incline and conveyor add m·g·sin θ·s and μ·m·g·s to the kinetic energy [meriam2012 §3/6 work–energy, §6/3 dry friction (from memory); closed form]', () => {
    const inc = stopEnergy(equivalentImpact({ kind: 'incline', m: 20, v: 1, theta: Math.PI / 6, Fp: 0 }), 0.04, 1, 0);
    expectClose({ label: 'incline E', computed: inc.E, expected: 10 + 20 * STANDARD_GRAVITY * 0.5 * 0.04, tol: 1e-12, why: 'sin 30° = 1/2' });
    const con = stopEnergy(equivalentImpact({ kind: 'conveyor', m: 50, v: 0.5, mu: 0.3 }), 0.02, 2, 0);
    expectClose({ label: 'conveyor E per stop', computed: con.E, expected: (6.25 + 0.3 * 50 * STANDARD_GRAVITY * 0.02) / 2, tol: 1e-12 });
  });
  it('n stops sharing a load each take 1/n of its energy, at the same speed and deceleration', () => {
    fc.assert(fc.property(fc.double({ min: 0.1, max: 1e3, noNaN: true }), fc.double({ min: 0.01, max: 10, noNaN: true }), fc.double({ min: 0, max: 1e4, noNaN: true }), fc.integer({ min: 1, max: 12 }), (m, v, Fp, n) => {
      const eq = equivalentImpact({ kind: 'linear', m, v, Fp, vertical: false });
      const one = stopEnergy(eq, 0.03, 1, 100);
      const many = stopEnergy(eq, 0.03, n, 100);
      expect(Math.abs(many.E * n - one.E)).toBeLessThanOrEqual(1e-12 * one.E);
      expect(Math.abs(many.me * n - one.me)).toBeLessThanOrEqual(1e-12 * one.me);
      expect(many.decel).toBe(one.decel);
    }), { seed: 1, numRuns: 100 });
  });
  it('effective mass is never below the inertia mass at the stop (drive and gravity only add energy)', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), fc.double({ min: 0.01, max: 20, noNaN: true }), fc.double({ min: 0.05, max: 2, noNaN: true }), fc.double({ min: 0, max: 1e3, noNaN: true }), (I, omega, R, M) => {
      const eq = equivalentImpact({ kind: 'rotary', I, omega, R, M });
      expect(stopEnergy(eq, 0.02, 1, 0).me).toBeGreaterThanOrEqual(eq.m * (1 - 1e-12));
    }), { seed: 1, numRuns: 100 });
  });
  it('refuses a fractional number of stops and an ambient at the body limit, naming the input', () => {
    const eq = equivalentImpact({ kind: 'freefall', m: 10, h: 0.2 });
    expect(() => stopEnergy(eq, 0.05, 1.5, 0)).toThrow(/'n'/);
    expect(() => deratedEnergyPerHour(1e5, 353.15, 293.15, 353.15)).toThrow(InputRangeError);
    expect(() => deratedEnergyPerHour(1e5, 353.15, 293.15, 353.15)).toThrow(/'Tamb'/);
  });
});

describe('stop body rating and reset', () => {
  it('a constant-conductance body keeps its rating at the rating ambient and loses it linearly to zero at its limit [incropera2007 §1.2.2 Newton cooling (from memory); closed form]', () => {
    expectClose({ label: 'at rating ambient', computed: deratedEnergyPerHour(1e5, 293.15, 293.15, 353.15), expected: 1e5, tol: 1e-12 });
    expectClose({ label: '60 °C ambient, 80 °C limit', computed: deratedEnergyPerHour(1e5, 333.15, 293.15, 353.15), expected: 1e5 / 3, tol: 1e-12 });
  });
  it('time between impacts is 3600 s per impacts per hour [closed form]', () => {
    const r = resetShare(1200, 1.5);
    expectClose({ label: 'tCycle', computed: r.tCycle, expected: 3, tol: 1e-15 });
    expectClose({ label: 'share', computed: r.share, expected: 0.5, tol: 1e-15 });
  });
});
