/** Argument parsing for the CLI: flags, repeated `--in key=value`, positionals. */
export interface ParsedArgs {
  readonly positionals: string[];
  readonly flags: Map<string, string | true>;
  readonly inputs: [string, string][];
  /** `--vary key=tolerance` pairs (calc only: tolerance envelopes). */
  readonly vary: [string, string][];
}

export class UsageError extends Error {
  override name = 'UsageError';
}

/** Options that take a value (`--pdf out.pdf` or `--pdf=out.pdf`). */
export const VALUE_FLAGS: readonly string[] = ['record', 'out', 'pdf', 'paper', 'base', 'site', 'content', 'title', 'by', 'calc', 'project', 'project-no', 'calc-no', 'prepared-by', 'checked-by', 'date'];

/**
 * Refuses any option the command does not read (a typo or an option of another command would
 * otherwise be ignored silently), and `--in` where the command takes no inputs.
 */
export function requireKnownOptions(command: string, args: ParsedArgs, options: readonly string[], takesInputs: boolean): void {
  for (const k of args.flags.keys()) {
    if (k === 'help' || options.includes(k)) continue;
    const list = options.length ? options.map((o) => `--${o}`).join(', ') : 'none';
    throw new UsageError(`${command} does not take --${k}; its options: ${list}${takesInputs ? ', --in key=value' : ''}`);
  }
  if (!takesInputs && args.inputs.length) throw new UsageError(`${command} does not take --in`);
  if (args.vary.length && !options.includes('vary')) throw new UsageError(`${command} does not take --vary`);
}

export function parseArgs(argv: readonly string[]): ParsedArgs {
  const positionals: string[] = [];
  const flags = new Map<string, string | true>();
  const inputs: [string, string][] = [];
  const vary: [string, string][] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a === '--in' || a === '-i') {
      const kv = argv[++i];
      if (kv === undefined) throw new UsageError('--in needs key=value');
      const eq = kv.indexOf('=');
      if (eq <= 0) throw new UsageError(`--in ${kv}: expected key=value`);
      inputs.push([kv.slice(0, eq), kv.slice(eq + 1)]);
    } else if (a === '--vary' || a.startsWith('--vary=')) {
      const kv = a === '--vary' ? argv[++i] : a.slice('--vary='.length);
      if (kv === undefined) throw new UsageError('--vary needs key=±15% or key=lo..hi');
      const eq = kv.indexOf('=');
      if (eq <= 0) throw new UsageError(`--vary ${kv}: expected key=±15% or key=lo..hi`);
      vary.push([kv.slice(0, eq), kv.slice(eq + 1)]);
    } else if (a.startsWith('--')) {
      const eq = a.indexOf('=');
      if (eq > 0) flags.set(a.slice(2, eq), a.slice(eq + 1));
      else {
        const next = argv[i + 1];
        const takesValue = VALUE_FLAGS.includes(a.slice(2));
        if (takesValue && next === undefined) throw new UsageError(`${a} needs a value`);
        if (takesValue) { flags.set(a.slice(2), next!); i++; } else flags.set(a.slice(2), true);
      }
    } else positionals.push(a);
  }
  return { positionals, flags, inputs, vary };
}
