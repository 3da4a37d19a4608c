/**
 * The first script a calculator page runs: an async module placed right after the study bar, so it
 * runs while the rest of the page is still being read. When a study will open (named in the
 * address, or kept in this browser) it starts the study's fetch and its step calculators' chunks
 * at once, beside the page's own scripts, instead of after the calculator element has loaded and
 * run (about 0.1 s later on a quiet machine, 0.7 s on a loaded one). Only a head start: the
 * calculator element calls the same `openingStudy` and finds the work begun.
 */
import { openingStudy } from './study-fetch.ts';

performance.mark('db-study-early');
openingStudy();
