/**
 * The machine-readable change list (src/calculators/changes.ts) against CHANGELOG.md and the
 * registry: one entry per version section and back, known calculator ids, the package version
 * listed, and the notes a record or study from an older core receives.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { changeLines, changesSince, compareVersions, RESULT_CHANGES } from '../../src/calculators/changes.ts';
import { calculatorIds } from '../../src/calculators/registry.ts';

const headings = [...readFileSync('CHANGELOG.md', 'utf8').matchAll(/^## (\d+\.\d+\.\d+)\b/gm)].map((m) => m[1]!);
const listed = RESULT_CHANGES.map((v) => v.version);

describe('change list', () => {
  it('has an entry for every CHANGELOG version section and a section for every entry', () => {
    expect(headings.length).toBeGreaterThanOrEqual(5);
    expect([...listed].sort(compareVersions)).toEqual([...headings].sort(compareVersions));
  });

  it('lists the package version (the core version printed on every sheet)', () => {
    const { version } = JSON.parse(readFileSync('package.json', 'utf8')) as { version: string };
    expect(listed).toContain(version);
  });

  it('is oldest first and names only registered calculators', () => {
    expect(listed).toEqual([...listed].sort(compareVersions));
    const ids = new Set(calculatorIds());
    expect(RESULT_CHANGES.flatMap((v) => v.changes.flatMap((c) => c.calculators)).filter((id) => !ids.has(id))).toEqual([]);
  });

  it('tells a 0.3.0 impact record about the per-stop change of 0.4.0 only', () => {
    // common practice, no source: the 0.4.0 CHANGELOG section lists impact's per-stop results
    const notes = changesSince('0.3.0', '0.4.0', ['impact']);
    expect(notes.map((n) => n.version)).toEqual(['0.4.0']);
    expect(notes[0]!.what).toMatch(/per stop/);
    expect(changeLines('0.1.0', '0.4.0', ['sdof'])).toEqual([expect.stringMatching(/^Core 0\.2\.0 changed sdof: /)]);
    expect(changeLines('0.4.0', '0.4.0', ['sdof'])).toEqual([]);
    expect(changeLines('0.3.0', '0.4.0', ['sdof'])[0]).toMatch(/No change between core 0\.3\.0 and 0\.4\.0 touches sdof/);
    expect(changeLines('0.9.0', '0.4.0', ['sdof'])[0]).toMatch(/newer than this handbook/);
  });

  it('compares versions numerically', () => {
    expect(compareVersions('0.10.0', '0.9.0')).toBe(1);
    expect(compareVersions('0.4.0', '0.4.0-rc.1')).toBe(0);
  });
});
