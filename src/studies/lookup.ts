/**
 * How study code finds a step's calculator. The CLI, the build and the tests pass the whole
 * registry (`getCalculator`); the browser passes only the definitions the open study's steps and
 * the page need, loaded through `calculatorLoaders` — importing the registry would make every page
 * with a study download every calculator (about 470 KB of scripts before the first step runs).
 */
import type { CalculatorDefinition } from '../calculators/types.ts';

export type CalculatorLookup = (id: string) => CalculatorDefinition | undefined;
