/**
 * The first module a calculator page runs: an async module placed right after the study bar, so it
 * runs while the rest of the page is still being read. When a study will open (named in the
 * address, or kept in this browser) it opens the page's study session at once — fetch, schema
 * check, step calculators, the whole run — instead of after the calculator element has loaded and
 * run (that element is a deferred module: it waits for the whole page to be parsed). The element
 * then finds the session open and only fills its step (`studySession` and `openingStudy` are both
 * memoised).
 */
import { openingStudy } from './study-fetch.ts';

performance.mark('db-study-early');
if (openingStudy()) void import('./study-link.ts').then((m) => m.studySession()).catch(() => undefined);
