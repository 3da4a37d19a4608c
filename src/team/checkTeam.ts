/**
 * The rules every built-in calculator meets in the test suite, run by `dampbook check --content`
 * on a handbook folder's own calculators: each has verification cases of the shared shape (a
 * source from the bibliography and a provenance), each case computes its expected outputs, and
 * the bad-input rules hold (src/calculators/badInput/suite.ts, fixed seed).
 */
import { badInputProblems } from '../calculators/badInput/suite.ts';
import { caseSchema } from '../calculators/caseSchema.ts';
import type { CalculatorDefinition } from '../calculators/types.ts';
import { definitionCases, describeRow, runCase } from '../content/verify.ts';

export interface TeamCheck {
  readonly lines: readonly string[];
  readonly failed: number;
  readonly checks: number;
}

/** Random valid cases per calculator in the bad-input rules (the built-ins' suite runs 150 too). */
const RUNS = 150;

export function checkTeamCalculators(defs: readonly { readonly file: string; readonly calc: CalculatorDefinition }[]): TeamCheck {
  const lines: string[] = [];
  let failed = 0;
  let checks = 0;
  for (const { file, calc } of defs) {
    const problems: string[] = [];
    if (calc.verification.length === 0) problems.push('no verification cases: give at least one, with its source (see README "Your own handbook")');
    calc.verification.forEach((v, i) => {
      const r = caseSchema.safeParse(v);
      if (!r.success) { const is = r.error.issues[0]!; problems.push(`verification.${i}.${is.path.join('.')}: ${is.message}`); }
    });
    const rows = definitionCases(calc).flatMap(runCase);
    checks += rows.length;
    for (const r of rows) if (!r.pass) problems.push(`verification ${describeRow(r)}`);
    const bad = badInputProblems(calc, { seed: 1, runs: RUNS });
    problems.push(...bad.map((p) => `bad input: ${p}`));
    if (problems.length) { failed++; for (const p of problems) lines.push(`FAIL ${file}: ${calc.id}: ${p}`); }
    else lines.push(`ok   ${file}: ${calc.id}; ${calc.verification.length} case(s), ${rows.length} check(s) pass; bad-input rules hold`);
  }
  return { lines, failed, checks };
}
