/**
 * A long CSV record built from a calculator's own default record: the header and the numeric
 * rows are repeated, with the first column (time or position) continued at the default's own
 * step, so the generated record is as valid as the default. Returns undefined when the default
 * is not a numeric CSV with an increasing first column.
 */
export function generateCsv(template: string, rows: number): string | undefined {
  const lines = template.split(/\r?\n/).filter((l) => l.trim() !== '');
  const sep = lines.some((l) => l.includes(',')) ? ',' : lines.some((l) => l.includes(';')) ? ';' : /\s/;
  const split = (l: string) => l.trim().split(sep).map((c) => c.trim());
  const numeric = (l: string) => split(l).every((c) => c !== '' && Number.isFinite(Number(c)));
  const header = lines.filter((l) => !numeric(l));
  const data = lines.filter(numeric).map((l) => split(l).map(Number));
  if (data.length < 2 || header.length > 3) return undefined;
  const step = data[1]![0]! - data[0]![0]!;
  const span = data[data.length - 1]![0]! - data[0]![0]! + step;
  if (!(step > 0) || data.some((r, i) => i > 0 && r[0]! <= data[i - 1]![0]!)) return undefined;
  const joiner = typeof sep === 'string' ? sep : ' ';
  const out = [...header];
  for (let i = 0; i < rows; i++) {
    const src = data[i % data.length]!;
    const t = src[0]! + Math.floor(i / data.length) * span;
    out.push([Number(t.toPrecision(12)), ...src.slice(1)].join(joiner));
  }
  return out.join('\n');
}
