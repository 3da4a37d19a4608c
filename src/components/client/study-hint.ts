/**
 * The one classic (non-module) script of a calculator page, placed after the page's data blocks:
 * it runs the moment the parser reaches it. A module script, however early on the page, runs only
 * when the parser yields — on a long calculator page 0.2–0.4 s later — and the step calculators'
 * chunks used to be asked for only after that script had fetched the study and read its steps
 * (one more wait for a busy main thread). Here the page asks at once for every step calculator's
 * chunks: for a study named in the address from the build's list of each built-in study's
 * calculators (`db-study-steps`), for a study kept in this browser from its text. Only hints:
 * study-fetch.ts still fetches the study and imports everything, and the study schema still checks
 * the text before anything uses it.
 */
import { STUDY_STORE } from '../../studies/storeKey.ts';
import { announceChunks, pageData, stepCalculators } from './chunk-hints.ts';

try {
  const named = new URLSearchParams(location.search).get('study');
  if (named !== null) {
    const steps = pageData('db-study-steps');
    const ids = Object.hasOwn(steps, named) ? steps[named] : undefined;
    announceChunks(Array.isArray(ids) ? ids.filter((c): c is string => typeof c === 'string') : []);
  } else {
    announceChunks(stepCalculators(localStorage.getItem(STUDY_STORE)));
  }
} catch { /* storage blocked: the study code says so */ }
