import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { getCalculator } from '../../calculators/registry.ts';
import { isLegacyLawKey } from '../../calculators/shared/damperLawMigrate.ts';
import { checkBase, findPage, printSheet, SheetError, type SheetFields, type SheetText } from '../../sheets/print.ts';
import { UsageError, type ParsedArgs } from '../args.ts';
import { evaluateInputs, readInputs, summariseText, textLabel } from '../inputs.ts';

/**
 * `dampbook sheet <page> [--content dir] [--in key=value …] [--paper a4|letter] [--project …] [--project-no …]
 * [--calc-no …] [--prepared-by …] [--checked-by …] [--date …] [--site dist] [--base /] --pdf out.pdf`
 *
 * The inputs are read and checked exactly as `calc` reads them (the same reader, `@file` for
 * text inputs, missing required inputs and invalid values refused with calc's message) and
 * evaluated once here; the page is then given the very values calc computes with (numbers in SI,
 * text put into its field) and the sheet is refused unless the page computes with them. Each
 * text input is printed with its file name, rows and SHA-256.
 */
export async function sheet(args: ParsedArgs, out: (s: string) => void, err: (s: string) => void = () => {}): Promise<number> {
  const page = args.positionals[1];
  if (!page) throw new UsageError('sheet needs a page id or path, e.g. dampbook sheet sdof --pdf sdof.pdf');
  if (args.positionals.length > 2) throw new UsageError(`sheet takes one page; also given: ${args.positionals.slice(2).join(' ')}`);
  const pdf = args.flags.get('pdf');
  if (typeof pdf !== 'string') throw new UsageError('sheet needs --pdf <out.pdf>');
  const paper = args.flags.get('paper') ?? 'a4';
  if (paper !== 'a4' && paper !== 'letter') throw new UsageError(`--paper ${String(paper)}: use a4 or letter`);
  const f = (k: string) => (typeof args.flags.get(k) === 'string' ? (args.flags.get(k) as string) : undefined);
  const fields: SheetFields = { project: f('project'), no: f('project-no'), calc: f('calc-no'), by: f('prepared-by'), checker: f('checked-by'), date: f('date') };
  const site = f('site') ?? 'dist';
  const base = checkBase(f('base') ?? process.env.DAMPBOOK_BASE ?? '/');
  if (!existsSync(join(site, 'index.html'))) throw new SheetError(`no built handbook in ${site}: run npm run build first, or give --site <folder>`);
  const built = findPage(site, page);

  // the same reading and checks as calc, for every calculator on the page
  // a team calculator (a handbook folder's own) is known only with --content: without it the sheet
  // prints the page's own defaults (computed by the page), but inputs cannot be checked: say so
  const missing = built.calculators.filter((id) => !getCalculator(id));
  if (missing.length && (args.inputs.length > 0 || args.flags.has('content'))) throw new SheetError(`the page uses calculator ${missing.map((id) => `'${id}'`).join(', ')}, which this tool does not have${args.flags.has('content') ? '' : ': give the handbook folder with --content <dir>'}`);
  const defs = built.calculators.map((id) => getCalculator(id)).filter((d) => d !== undefined);
  const keys = new Set(defs.flatMap((d) => d.inputs.map((i) => i.key)));
  const unknown = args.inputs.map(([k]) => k).filter((k) => !keys.has(k) && !defs.some((d) => isLegacyLawKey(d, k)));
  if (unknown.length) throw new SheetError(`the page has no input ${unknown.map((k) => `'${k}'`).join(', ')}; inputs: ${[...keys].join(', ') || 'none'}`);
  const address: [string, string][] = [];
  const texts: SheetText[] = [];
  const expect: Record<string, Record<string, number | string>> = {};
  for (const def of defs) {
    const mine = args.inputs.filter(([k]) => def.inputs.some((i) => i.key === k) || isLegacyLawKey(def, k));
    const read = readInputs(def, mine);
    for (const n of read.notes) err(`dampbook: note: ${n}`);
    const r = evaluateInputs(def, read);
    expect[def.id] = Object.fromEntries(Object.entries(r.values).filter((e): e is [string, number | string] => e[1] !== undefined));
    // the keys given, after old damper-law keys were mapped to the canonical ones
    for (const k of Object.keys(read.raw)) {
      const v = r.values[k];
      const input = def.inputs.find((i) => i.key === k)!;
      if (v === undefined) continue; // an input that does not apply under the chosen options
      if (input.kind === 'text') {
        const t = read.texts.find((x) => x.key === k)!;
        texts.push({ key: k, text: String(v), label: `${input.label}: ${textLabel(t)}` });
      } else if (!address.some(([a]) => a === k)) address.push([k, String(v)]); // SI number (round-trips exactly) or choice
    }
    // a text input left at the page's own default is named as such, so every text on the sheet is identified
    for (const input of def.inputs) {
      const v = r.values[input.key];
      if (input.kind !== 'text' || typeof v !== 'string' || mine.some(([k]) => k === input.key) || texts.some((t) => t.key === input.key)) continue;
      texts.push({ key: input.key, text: v, label: `${input.label}: ${textLabel({ ...summariseText(input.key, v), file: 'page default' })}` });
    }
  }
  const { url } = await printSheet({ site, base, page, inputs: address, texts, expect, sheet: fields, paper, pdf: resolve(pdf) });
  out(`wrote ${pdf} (${paper === 'letter' ? 'US Letter' : 'A4'}) from ${url.length > 200 ? `${url.slice(0, 200)}…` : url}`);
  return 0;
}
