import fc from 'fast-check';
import { getCalculator } from '../../src/calculators/registry.ts';
import { validRecord } from '../../test/calculators/hostile.arbitraries.ts';
const calc = getCalculator(process.argv[2]!)!;
const raw = fc.sample(validRecord(calc), { numRuns: Number(process.argv[3]), seed: 42 });
const r = raw[Number(process.argv[3]) - 1]!;
const d = Object.fromEntries(calc.inputs.map((i) => [i.key, i.default]));
console.log(JSON.stringify(Object.fromEntries(Object.entries(r).filter(([k, v]) => v !== d[k]))));
