/**
 * `dampbook study run <study.json> [--json]`, `dampbook study check <study.json>`,
 * `dampbook study sheet <study.json> --pdf out.pdf [--paper a4|letter] [--site dist]`.
 * The study runs through the same planner and runner as the built package page; a missing or
 * invalid input, a dangling binding or a cycle exits 1 with one line naming the step and input.
 */
import { resolve } from 'node:path';
import { readFileSync } from 'node:fs';
import { changeLines } from '../../calculators/changes.ts';
import { getCalculator } from '../../calculators/registry.ts';
import { siSymbol } from '../../core/units/index.ts';
import { printSheet } from '../../sheets/print.ts';
import { planStudy, StudyError } from '../../studies/plan.ts';
import { runStudy } from '../../studies/run.ts';
import { MAX_STUDY_CHARS, parseStudy, STUDY_STORE, type Study } from '../../studies/schema.ts';
import { UsageError, type ParsedArgs } from '../args.ts';
import { fileLimit, summariseText, textLabel } from '../inputs.ts';
import { FileReadError, readBoundedFile } from '../readFile.ts';

function readStudy(args: ParsedArgs): { study: Study; file: string } {
  const file = args.positionals[2];
  if (!file) throw new UsageError('study needs a study file, e.g. dampbook study run content/studies/tw-118-end-stop.json');
  let text: string;
  // regular files only, at most the limit + 1 bytes read (`study run /dev/zero` once read without end)
  try { text = readBoundedFile(file, fileLimit(MAX_STUDY_CHARS)).text; } catch (e) {
    if (e instanceof FileReadError) throw new StudyError(`study: ${e.message}`);
    throw e;
  }
  const p = parseStudy(text);
  if (!p.ok) throw new StudyError(`${file}: ${p.message}`);
  return { study: p.study, file };
}

const fmt = (v: number | string | null | undefined) => (typeof v === 'number' ? String(Number(v.toPrecision(6))) : String(v));

/** A step's inputs for `--json`: text inputs summarised (characters, rows, checksum) like `calc`, never echoed back. */
function shownInputs(calculator: string, inputs: Readonly<Record<string, number | string | undefined>>): Record<string, unknown> {
  const defs = getCalculator(calculator)?.inputs ?? [];
  return Object.fromEntries(Object.entries(inputs).map(([k, v]) =>
    [k, typeof v === 'string' && defs.find((d) => d.key === k)?.kind === 'text' ? textLabel(summariseText(k, v)) : v]));
}

/** The core version this CLI runs: the package version. */
function coreVersion(): string {
  return (JSON.parse(readFileSync(new URL('../../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
}

/** For a study made with another core: the result changes since then that touch its calculators. */
function versionNotes(study: Study): string[] {
  if (!study.coreVersion) return [];
  return changeLines(study.coreVersion, coreVersion(), [...new Set(study.steps.map((s) => s.calculator))]);
}

function run(args: ParsedArgs, out: (s: string) => void): number {
  const { study } = readStudy(args);
  const r = runStudy(study, getCalculator);
  const notes = versionNotes(study);
  if (args.flags.has('json')) {
    out(JSON.stringify({
      study: study.title,
      ...(study.coreVersion ? { coreVersion: study.coreVersion, changes: notes } : {}),
      steps: r.steps.map((s) => ({ id: s.id, calculator: s.calculator, inputs: shownInputs(s.calculator, s.inputs), outputs: Object.fromEntries(Object.entries(s.outputs).filter(([, v]) => v !== undefined)), from: s.from })),
      verdicts: r.verdicts.map((v) => ({ step: v.step, check: v.check, value: v.value, limit: v.limit, pass: v.pass })),
    }));
    return 0;
  }
  out(`${study.title} (${study.project.calculationNo})`);
  for (const n of notes) out(`note: ${n}`);
  for (const s of r.steps) {
    const calc = getCalculator(s.calculator)!;
    out(`step ${s.id}: ${calc.title} (${s.calculator})`);
    for (const [k, ref] of Object.entries(s.from)) out(`  ${k} ← ${ref}`);
    for (const o of calc.outputs) {
      const v = s.outputs[o.key];
      if (v === undefined) continue;
      out(`  ${o.key.padEnd(10)} ${fmt(v)}${o.kind !== 'text' && siSymbol(o.kind) ? ` ${siSymbol(o.kind)}` : ''}   ${o.label}`);
    }
    for (const w of s.warnings) out(`  warning: ${w}`);
  }
  for (const v of r.verdicts) out(`${v.pass ? 'PASS' : 'FAIL'} ${v.step} ${v.check}: ${fmt(v.value)} against ${fmt(v.limit)} (${v.what})`);
  return 0;
}

function check(args: ParsedArgs): number {
  const { study } = readStudy(args);
  planStudy(study, getCalculator);
  runStudy(study, getCalculator);
  return 0;
}

async function sheet(args: ParsedArgs, out: (s: string) => void): Promise<number> {
  const { study } = readStudy(args);
  const pdf = args.flags.get('pdf');
  if (typeof pdf !== 'string') throw new UsageError('study sheet needs --pdf <out.pdf>');
  const paper = args.flags.get('paper') ?? 'a4';
  if (paper !== 'a4' && paper !== 'letter') throw new UsageError(`--paper ${String(paper)}: use a4 or letter`);
  check(args);
  const site = typeof args.flags.get('site') === 'string' ? (args.flags.get('site') as string) : 'dist';
  const base = typeof args.flags.get('base') === 'string' ? (args.flags.get('base') as string) : process.env.DAMPBOOK_BASE ?? '/';
  // any study file prints through the page that prints the study open in a browser: the same
  // element tree as the built packages, so a study need not be in content/ when the site is built
  const { url } = await printSheet({
    site, base, page: 'studies/open', paper, pdf: resolve(pdf),
    storage: { [STUDY_STORE]: JSON.stringify(study) }, ready: '[data-open-package][data-ready="package"]',
  });
  out(`wrote ${pdf} (${paper === 'letter' ? 'US Letter' : 'A4'}) from ${url}`);
  return 0;
}

export async function study(args: ParsedArgs, out: (s: string) => void): Promise<number> {
  const sub = args.positionals[1];
  if (sub === 'run') return run(args, out);
  if (sub === 'check') return check(args);
  if (sub === 'sheet') return sheet(args, out);
  throw new UsageError(`study needs run, check or sheet: dampbook study run <study.json> [--json]`);
}
