import { NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import { ALPHA_RANGE, type DamperLaw } from './laws.ts';

/** Checks every parameter of a law; throws InputRangeError naming the parameter. */
export function validateLaw(law: DamperLaw): DamperLaw {
  switch (law.kind) {
    case 'linear':
      requireInRange('c', law.c, NON_NEGATIVE, 'N·s/m');
      break;
    case 'power':
      requireInRange('c', law.C, NON_NEGATIVE, 'N·(s/m)^α');
      requireInRange('alpha', law.alpha, ALPHA_RANGE);
      break;
    case 'coulomb':
      requireInRange('Ff', law.Ff, NON_NEGATIVE, 'N');
      break;
    case 'bilinear':
      requireInRange('c1', law.rebound.c1, NON_NEGATIVE, 'N·s/m');
      requireInRange('c2', law.rebound.c2, NON_NEGATIVE, 'N·s/m');
      requireInRange('c1c', law.compression.c1, NON_NEGATIVE, 'N·s/m');
      requireInRange('c2c', law.compression.c2, NON_NEGATIVE, 'N·s/m');
      requireInRange('vknee', law.vknee, POSITIVE, 'm/s');
      break;
    case 'hysteretic':
      requireInRange('eta', law.eta, { min: 0, max: 10 });
      requireInRange('kh', law.k, POSITIVE, 'N/m');
      break;
  }
  return law;
}
