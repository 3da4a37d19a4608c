/** Shared helpers for the thermal tests: the core under test, re-exported, plus the rating. */
import { bodyCooling, steadyTemperature, type Body } from '../../../src/core/thermal/index.ts';

export { bodyCooling, steadyTemperature, type Body };

/** Continuous rating at an allowed temperature: the heat the body sheds there. */
export function powerFor(b: Body, Tmax: number): number {
  return bodyCooling(b, Tmax).Q;
}
