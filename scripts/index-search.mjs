// Builds the offline search index over the built site with Pagefind's Node API. KaTeX markup is
// excluded, or the index fills with TeX source and MathML.
import * as pagefind from 'pagefind';

const site = process.env.DAMPBOOK_OUT ?? 'dist';
const t0 = performance.now();
const { index, errors } = await pagefind.createIndex({ excludeSelectors: ['.katex', '.calc-inputs', '.chart-canvas'] });
if (!index) throw new Error(`search index: ${errors.join('; ')}`);
const added = await index.addDirectory({ path: site });
if (added.errors.length) throw new Error(`search index: ${added.errors.join('; ')}`);
const written = await index.writeFiles({ outputPath: `${site}/pagefind` });
if (written.errors.length) throw new Error(`search index: ${written.errors.join('; ')}`);
await pagefind.close();
console.log(`search index: ${added.page_count} pages in ${((performance.now() - t0) / 1000).toFixed(2)} s`);

// The stock search UI files are not used (the handbook has its own search box): remove them.
import { readdirSync, rmSync } from 'node:fs';
for (const f of readdirSync(`${site}/pagefind`)) if (/^pagefind-((component-|modular-)?ui|highlight)\./.test(f)) rmSync(`${site}/pagefind/${f}`);
