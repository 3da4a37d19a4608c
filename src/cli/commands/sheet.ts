import { resolve } from 'node:path';
import { printSheet, type SheetFields } from '../../sheets/print.ts';
import { UsageError, type ParsedArgs } from '../args.ts';

/**
 * `dampbook sheet <page> [--in key=value …] [--paper a4|letter] [--project …] [--project-no …]
 * [--calc-no …] [--prepared-by …] [--checked-by …] [--date …] [--site dist] [--base /] --pdf out.pdf`
 */
export async function sheet(args: ParsedArgs, out: (s: string) => void): Promise<number> {
  const page = args.positionals[1];
  if (!page) throw new UsageError('sheet needs a page id or path, e.g. dampbook sheet sdof --pdf sdof.pdf');
  const pdf = args.flags.get('pdf');
  if (typeof pdf !== 'string') throw new UsageError('sheet needs --pdf <out.pdf>');
  const paper = args.flags.get('paper') ?? 'a4';
  if (paper !== 'a4' && paper !== 'letter') throw new UsageError(`--paper ${String(paper)}: use a4 or letter`);
  const f = (k: string) => (typeof args.flags.get(k) === 'string' ? (args.flags.get(k) as string) : undefined);
  const fields: SheetFields = { project: f('project'), no: f('project-no'), calc: f('calc-no'), by: f('prepared-by'), checker: f('checked-by'), date: f('date') };
  const site = f('site') ?? 'dist';
  const { url } = await printSheet({ site, base: f('base') ?? process.env.DAMPBOOK_BASE ?? '/', page, inputs: args.inputs, sheet: fields, paper, pdf: resolve(pdf) });
  out(`wrote ${pdf} (${paper === 'letter' ? 'US Letter' : 'A4'}) from ${url}`);
  return 0;
}
