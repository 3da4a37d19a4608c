/**
 * Verification cases of the impact calculator (closed forms of the work–energy balance, one per
 * load case, and the derated energy-per-hour rating). Kept apart from the definition for length.
 */
import type { VerificationCase } from '../types.ts';

export const IMPACT_CASES: VerificationCase[] = [
  {
    name: 'Horizontal carriage, no drive force: E = ½mv², F = E/s, a = v²/2s (TW-118 carriage, 12 kg at 1.5 m/s, 25 mm)',
    inputs: { m: 12, v: 1.5, Fp: 0, s: 0.025, cph: 1200, vertical: 0, vEndRatio: 0 },
    expected: { E: 13.5, Ehour: 16200, P: 4.5, Favg: 540, decel: 45, FpeakLinear: 1080, efficiencyLinear: 0.5 },
    tolerance: 1e-9, why: 'closed form, same arithmetic',
    source: { key: 'meriam2012', locator: '§3/6 work–energy; §3/5 velocity-proportional resistance (sections from memory)' },
    provenance: 'closed form',
  },
  {
    name: 'Vertical drop onto the stop: gravity adds m·g·s (100 kg at 1 m/s over 50 mm)',
    inputs: { m: 100, v: 1, Fp: 0, s: 0.05, cph: 60, vertical: 1, vEndRatio: 0.05 },
    expected: { E: 50 + 100 * 9.80665 * 0.05, Egravity: 49.033250, decel: 10 },
    tolerance: 1e-9, why: 'closed form with standard gravity 9.80665 m/s² (exact by definition)',
    source: { key: 'meriam2012', locator: '§3/6 work–energy principle (section from memory)' },
    provenance: 'closed form',
  },
  {
    name: 'Cylinder pushing through the stroke: 60 N over 25 mm adds 1.5 J (TW-118 Packline 4)',
    inputs: { m: 12, v: 1.5, Fp: 60, s: 0.025, cph: 1200, vertical: 0, vEndRatio: 0.05 },
    expected: { E: 15, Ehour: 18000, P: 5, Favg: 600 },
    tolerance: 1e-9, why: 'closed form, same arithmetic',
    source: { key: 'meriam2012', locator: '§3/6 work–energy principle (section from memory)' },
    provenance: 'closed form',
  },
  {
    name: 'Turntable on its stop: E = ½Iω² + M·s/R, v = ωR, m_e = 2E/v² (I = 5 kg·m², ω = 2 rad/s, R = 0.5 m, M = 20 N·m, 25 mm)',
    inputs: { loadCase: 'rotary', I: 5, omega: 2, R: 0.5, M: 20, s: 0.025, cph: 60, vEndRatio: 0.05 },
    expected: { E: 11, vImpact: 1, me: 22, Ekinetic: 10, Epropel: 1 },
    tolerance: 1e-9, why: 'closed form, same arithmetic',
    source: { key: 'meriam2012', locator: '§6/6 work–energy of a rigid body in rotation, T = ½Iω², work of a couple Mθ (section from memory)' },
    provenance: 'closed form',
  },
  {
    name: 'Free fall of 10 kg from 0.2 m onto a 50 mm stop: v = √(2gh), E = m·g·(h + s), m_e = m(h + s)/h',
    inputs: { loadCase: 'freefall', m: 10, h: 0.2, s: 0.05, cph: 60, vEndRatio: 0.05 },
    expected: { vImpact: Math.sqrt(2 * 9.80665 * 0.2), E: 10 * 9.80665 * 0.25, me: 12.5 },
    tolerance: 1e-9, why: 'closed form with standard gravity 9.80665 m/s² (exact by definition): 1.981 m/s, 24.52 J, 12.5 kg',
    source: { key: 'meriam2012', locator: '§3/6 work–energy, §3/7 potential energy of gravity (sections from memory)' },
    provenance: 'closed form',
  },
  {
    name: 'Two stops share a conveyor load: E = (½mv² + μ·m·g·s)/2 (50 kg at 0.5 m/s, μ = 0.3, 20 mm)',
    inputs: { loadCase: 'conveyor', m: 50, v: 0.5, friction: 0.3, n: 2, s: 0.02, cph: 360, vEndRatio: 0.05 },
    expected: { E: (6.25 + 0.3 * 50 * 9.80665 * 0.02) / 2, Etotal: 6.25 + 0.3 * 50 * 9.80665 * 0.02, tCycle: 10 },
    tolerance: 1e-9, why: 'closed form, Coulomb friction μ·N (same arithmetic)',
    source: { key: 'meriam2012', locator: '§3/6 work–energy; §6/3 dry friction μN (sections from memory)' },
    provenance: 'closed form',
  },
  {
    name: 'Energy-per-hour rating derated from 20 °C to a 60 °C machine with an 80 °C body limit: one third of the rating',
    inputs: { m: 12, v: 1.5, Fp: 60, s: 0.025, cph: 1200, vEndRatio: 0.05, EhRated: 100e3, Trated: 293.15, Tamb: 333.15, Tmax: 353.15 },
    expected: { EhAllow: 100e3 / 3, EhUse: 18000 / (100e3 / 3) },
    tolerance: 1e-9, why: 'closed form of a constant-conductance body, Q = UA(T − T_amb)',
    source: { key: 'incropera2007', locator: '§1.2.2 Newton\'s law of cooling, eq. 1.3a (from memory)' },
    provenance: 'closed form',
  },
];
