import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { getCalculator } from '../../calculators/registry.ts';
import { topicTitles } from '../../content/handbookConfig.ts';
import { readHandbookConfig } from '../../content/readHandbookConfig.ts';
import { pageSchemaFor } from '../../content/schema.ts';
import { UsageError, type ParsedArgs } from '../args.ts';
import { parsePage } from '../pages.ts';


/**
 * `dampbook new <folder/slug> [--title …] [--by …] [--calc id] [--content dir]`: writes a draft
 * page with its frontmatter record and a calculator slot. Never overwrites a file.
 */
export function newPage(args: ParsedArgs, out: (s: string) => void): number {
  const slug = args.positionals[1];
  if (!slug || !/^([a-z0-9-]+\/)?[a-z0-9-]+$/.test(slug)) throw new UsageError('new needs a slug: <folder>/<page-id> or <page-id>, lower-case letters, digits and hyphens (e.g. thermal/fin-cooling)');
  const dir = typeof args.flags.get('content') === 'string' ? (args.flags.get('content') as string) : 'content';
  if (!existsSync(dir)) throw new UsageError(`no content folder '${dir}'`);
  // the topic is the folder's, from the handbook's own config (a page under another folder would not build)
  const config = readHandbookConfig(dir);
  const [folder, id] = slug.includes('/') ? (slug.split('/') as [string, string]) : ['handbook', slug];
  const topicOf = config.topics.find((t) => t.id === folder);
  if (!topicOf) throw new UsageError(`'${folder}' is not a topic folder of ${join(dir, 'handbook.config.json')}; topics: ${config.topics.map((t) => t.id).join(', ')} (write <topic>/<page-id>)`);
  const file = join(dir, folder, `${id}.mdx`);
  if (existsSync(file)) throw new UsageError(`${file} exists; choose another slug`);
  const flag = (k: string, d: string) => (typeof args.flags.get(k) === 'string' ? (args.flags.get(k) as string) : d);
  const calcId = flag('calc', '');
  if (calcId && !getCalculator(calcId)) throw new UsageError(`unknown calculator '${calcId}' (see dampbook list)`);
  const title = flag('title', id.replace(/-/g, ' ').replace(/^./, (c) => c.toUpperCase()));
  const topic = topicOf.title;
  const q = (s: string) => JSON.stringify(s);
  const text = `---
id: ${id}
title: ${q(title)}
summary: ${q('One or two sentences: what this page computes and for whom.')}
topic: ${q(topic)}
tags: []
revision: A
status: draft
preparedBy: ${q(flag('by', 'Unassigned'))}
prepared: ${new Date().toISOString().slice(0, 10)}
calculators: [${calcId}]
references: []
# A checked or approved page needs checkedBy/checked (and approvedBy/approved); an approved page
# needs at least one verification case, e.g.:
#  - name: Textbook example 2.1
#    calculator: ${calcId || 'sdof'}
#    inputs: { m: 10, k: 4000, c: 40 }
#    expected: { zeta: 0.1 }
#    tolerance: 1.0e-6
#    source: { key: rao2017, locator: 'Example 2.1' }
#    provenance: published
verification: []
---

## What this page is for

State the question the page answers and the decision it supports.

## Method

The formulas, with $…$ and $$…$$ (KaTeX), and where each comes from.

## Assumptions and limits

- …

${calcId ? `<Calculator id="${calcId}" />` : `{/* <Calculator id="…" />  — see \`npx dampbook list\` for calculator ids */}`}

## Worked example

A worked example from one of the demo projects (DEVELOPERS.md, "The demo scenario").
`;
  // what `check` (and the build) would refuse is refused here, before anything is written
  const problems = parsePage(text, pageSchemaFor(topicTitles(config))).errors;
  if (problems.length) throw new UsageError(`not written: the page would fail check: ${problems.join('; ')}${problems.some((p) => p.startsWith('title')) ? ' (give --title "…")' : ''}`);
  mkdirSync(dirname(file), { recursive: true });
  writeFileSync(file, text, { flag: 'wx' });
  out(`wrote ${file} (draft, revision A); fill the frontmatter, then run: npx dampbook check`);
  return 0;
}
