/** Verification cases of thermal-life (closed forms worked by hand and one independent quadrature). */
import type { VerificationCase } from '../types.ts';

const H = 3600;
/** 1000 h at 100 °C, E_a = 82.4 kJ/mol (E_a/R = 9910.44 K): the page's seal law. */
const SEAL = { model: 'arrhenius', Lref: 1000 * H, Tref: 373.15, Ea: 82.4e3 } as const;

export const THERMAL_LIFE_CASES: readonly VerificationCase[] = [
  {
    name: 'Half the time at 80 °C, half at 110 °C: lives 4500 h and 500 h, Miner sum gives 900 h',
    inputs: { ...SEAL, mode: 'history', history: 't [h], T [°C]\n0, 80\n450, 80\n450, 110\n900, 110' },
    expected: { life: 3239940.26, damage: 1.0000184, Teq: 374.636464 },
    tolerance: 1e-7,
    why: 'L = L_ref·exp[(E_a/R)(1/T − 1/T_ref)] at 80 and 110 °C, 1/(0.5/4500.16 + 0.5/499.988) = 899.983 h, worked by hand and in float64',
    source: { key: 'miner1945', locator: 'linear damage sum Σ n/N (time over life, common practice for thermal ageing)' },
    provenance: 'closed form',
  },
  {
    name: 'Constant 80 °C for an 8 h duty: life 4500.16 h, damage 8/4500.16',
    inputs: { ...SEAL, mode: 'constant', T: 353.15, tConst: 8 * H },
    expected: { life: 16200571.22, damage: 0.0017777151, Teq: 353.15, halving: 8.7226984 },
    tolerance: 1e-8,
    why: 'Arrhenius life at one temperature; halving interval R·T²·ln2/E_a at 80 °C; float64',
    source: { key: 'iso11346', locator: 'Arrhenius approach, time to threshold against 1/T (from memory)' },
    provenance: 'closed form',
  },
  {
    name: 'Halving law, 10 K: 30 K above the reference is an eighth of the life',
    inputs: { model: 'halving', Lref: 1000 * H, Tref: 373.15, dTh: 10, mode: 'constant', T: 403.15, tConst: 125 * H },
    expected: { life: 450000, damage: 1, Teq: 403.15 },
    tolerance: 1e-10,
    why: '2^−3 · 1000 h = 125 h, exact',
    source: { key: 'iso11346', locator: 'the life–temperature relation taken as a fixed halving interval, the maker\'s shorthand (common practice; from memory)' },
    provenance: 'common practice, no source',
  },
  {
    name: 'A ramp 20 → 120 °C in 10 h: damage by 30-digit quadrature',
    inputs: { ...SEAL, mode: 'history', history: 't [h], T [°C]\n0, 20\n10, 120' },
    expected: { damage: 0.00559356082, life: 6435971.853, Teq: 365.16216366 },
    tolerance: 1e-9,
    why: '∫ dt / L(T(t)) evaluated independently with mpmath quad at 30 digits',
    source: { key: 'iso11346', locator: 'Arrhenius life (from memory), integrated over a linear temperature ramp' },
    provenance: 'reference library mpmath@1.3.0',
  },
  {
    name: 'Highest constant temperature for 20 000 h with the seal law',
    inputs: { ...SEAL, mode: 'constant', T: 353.15, tConst: 8 * H, tReq: 20000 * H },
    expected: { Tmax: 335.3265329 },
    tolerance: 1e-9,
    why: '1/T = 1/T_ref + (R/E_a) ln(20 000/1000), float64',
    source: { key: 'iso11346', locator: 'maximum temperature of use for a required life from the Arrhenius line (from memory)' },
    provenance: 'closed form',
  },
];
