/**
 * The `dampbook` command line over the same calculator registry as the site. Errors print one
 * line and exit non-zero; stack traces only with DAMPBOOK_DEBUG=1.
 */
import { existsSync } from 'node:fs';
import { DampbookError } from '../core/errors.ts';
import { SheetError } from '../sheets/print.ts';
import { escapeControls } from './escape.ts';
import { parseArgs, requireKnownOptions, UsageError, type ParsedArgs } from './args.ts';
import { batch } from './commands/batch.ts';
import { calc } from './commands/calc.ts';
import { check } from './commands/check.ts';
import { approve, checkOff } from './commands/signOff.ts';
import { list } from './commands/list.ts';
import { newPage } from './commands/new.ts';
import { sheet } from './commands/sheet.ts';
import { study } from './commands/study.ts';
import { build } from './commands/build.ts';
import { loadRegistry } from '../team/loadRegistry.ts';

/** `err` is stderr (deprecation notes); `out` is the command's output. */
type Command = (args: ParsedArgs, out: (s: string) => void, err: (s: string) => void) => number | Promise<number>;

/** Each command's options (besides --help) and whether it reads --in. */
interface CommandSpec { run: Command; help: string; options: readonly string[]; inputs: boolean }

export const commands: Record<string, CommandSpec> = {
  list: { run: list, options: ['json', 'content'], inputs: false, help: 'list [--json] [--content dir]      every calculator (with the handbook folder\'s own) with its inputs and outputs (SI units)' },
  calc: { run: calc, options: ['json', 'record', 'content', 'vary'], inputs: true, help: 'calc <id> --in key=value … [--json] [--content dir] evaluate a calculator (SI values, or "25 lb"; --content: also the folder\'s own calculators)\n  dampbook calc <id> … --vary key=±15% --vary key=lo..hi [--json]   tolerance envelope: min and max of every output (up to 8 inputs; lo..hi as --in: plain = SI, "0.9 kN·s/m")\n  dampbook calc --record file.json [--json]   recompute a saved record and report differences' },
  batch: { run: batch, options: ['csv', 'out', 'jobs', 'json', 'content'], inputs: false, help: 'batch <id> --csv cases.csv [--out results.csv] [--jobs N] [--json] [--content dir]   one case per row (header = input keys, cells as --in), outputs appended in SI; all cores by default' },
  check: { run: check, options: ['content', 'allow-changed'], inputs: false, help: 'check [--content dir] [--allow-changed]   validate every page, run every verification case, compare sign-off hashes' },
  approve: { run: approve, options: ['by', 'date', 'content'], inputs: false, help: 'approve <page-id> --by "<name>" [--date YYYY-MM-DD] [--content dir]   approve a page: status, name, date and the hash of what is approved' },
  'check-off': { run: checkOff, options: ['by', 'date', 'content'], inputs: false, help: 'check-off <page-id> --by "<name>" [--date YYYY-MM-DD] [--content dir]   mark a page checked, with the hash of what is checked' },
  build: { run: build, options: ['content', 'out', 'base'], inputs: false, help: 'build [--content dir] [--out dir] [--base /path/]   build the handbook of a content folder (default: the demo, into dist)' },
  new: { run: newPage, options: ['title', 'by', 'calc', 'content'], inputs: false, help: 'new <topic/id> [--title …] [--by …] [--calc id] [--content dir]   scaffold a draft page' },
  sheet: { run: sheet, options: ['content', 'pdf', 'paper', 'project', 'project-no', 'calc-no', 'prepared-by', 'checked-by', 'date', 'site', 'base'], inputs: true, help: 'sheet <page> [--in k=v …] [--paper a4|letter] [--project … --project-no … --calc-no … --prepared-by … --checked-by … --date …] [--site dist] --pdf out.pdf' },
  study: { run: study, options: ['content', 'json', 'pdf', 'paper', 'site', 'base'], inputs: false, help: 'study run <study.json> [--json] | study check <study.json> | study sheet <study.json> --pdf out.pdf [--paper a4|letter]' },
};

function usage(): string[] {
  return ['usage: dampbook <command> …', ...Object.values(commands).flatMap((c) => `  dampbook ${c.help}`.split('\n'))];
}

export async function main(argv: readonly string[], rawOut = (s: string) => console.log(s), rawErr = (s: string) => console.error(s)): Promise<number> {
  // every message is one line with control characters escaped (inputs, records and pages are untrusted)
  const out = (s: string) => rawOut(escapeControls(s));
  const err = (s: string) => rawErr(escapeControls(s));
  try {
    const args = parseArgs(argv);
    const name = args.positionals[0];
    if (!name || name === 'help' || args.flags.has('help')) { for (const l of usage()) out(l); return name ? 0 : 2; }
    const cmd = commands[name];
    if (!cmd) throw new UsageError(`unknown command '${name}'; commands: ${Object.keys(commands).join(', ')} (dampbook help shows usage)`);
    requireKnownOptions(name, args, cmd.options, cmd.inputs);
    // a handbook folder's own calculators join the registry before the command looks anything up
    const content = args.flags.get('content');
    if (content !== undefined && typeof content !== 'string') throw new UsageError('--content needs a folder: --content <dir>');
    if (typeof content === 'string') {
      if (!existsSync(content)) throw new UsageError(`no content folder '${content}'`);
      await loadRegistry({ content });
    } else if (name === 'check' || name === 'build') await loadRegistry({ content: 'content' });
    return await cmd.run(args, out, err);
  } catch (e) {
    if (process.env.DAMPBOOK_DEBUG === '1' && e instanceof Error) for (const l of (e.stack ?? e.message).split('\n')) err(l);
    else if (e instanceof DampbookError || e instanceof UsageError || e instanceof SheetError) err(`dampbook: ${e.message}`);
    else err(`dampbook: internal error: ${e instanceof Error ? e.message : String(e)} (set DAMPBOOK_DEBUG=1 for details)`);
    return e instanceof UsageError ? 2 : 1;
  }
}
