/** Where the test builds live (made once by test/site/globalSetup.ts). */
import { resolve } from 'node:path';

export const TEST_OUT = resolve('.test-out');
export const ROOT_BUILD = resolve(TEST_OUT, 'root');
export const SUB_BUILD = resolve(TEST_OUT, 'sub');
export const SUB_BASE = '/handbook/';
