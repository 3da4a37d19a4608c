/** Numerical building blocks shared by every domain. */
export { adaptiveSimpson } from './adaptiveSimpson.ts';
export { gamma } from './gamma.ts';
