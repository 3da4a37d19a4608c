/**
 * `dampbook/core`: the stable entry point a team's own calculators import the computation core
 * from (package.json "exports"; resolved inside and outside the project by src/build/
 * team-calculators.ts and src/team/loadRegistry.ts). Everything here is SI in, SI out, and throws
 * the typed errors below. Add a domain's index here when a new core folder is added.
 */
export * from './errors.ts';
export * from './constants.ts';
export * from './numeric/index.ts';
export * from './complex/index.ts';
export * from './ode/index.ts';
export * from './units/index.ts';
export * from './vibration/index.ts';
export * from './dampers/index.ts';
// two domains name a type Excitation: forced response's (harmonic) keeps the name, the simulation's is renamed
export type { Excitation } from './vibration/index.ts';
export type { Excitation as SimulationExcitation } from './simulation/index.ts';
export * from './simulation/index.ts';
export * from './duty/index.ts';
export * from './thermal/index.ts';
export * from './ageing/index.ts';
export * from './records/index.ts';
export { cite, sources } from './sources/index.ts';
export type { Source, SourceKey, SourceRef, Provenance } from './sources/index.ts';
