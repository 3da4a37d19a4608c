/**
 * Generated benchmark pages: ~1,500 words of prose, 20 inline and 10 display equations and (for
 * Dampbook) one sdof calculator. Deterministic (seeded), so runs compare like with like. The text
 * is filler for timing only; it is not handbook content.
 */
const WORDS = ('damper spring mass motion energy heat body oil valve piston stroke velocity force cycle '
  + 'amplitude frequency ratio test record peak decay envelope mount frame bracket carriage buffer '
  + 'the a of to and in is with for on at by from that this each which as are be its').split(' ');

const INLINE = [
  String.raw`\omega_n = \sqrt{k/m}`, String.raw`\zeta = \frac{c}{2\sqrt{km}}`, String.raw`c_{cr} = 2\sqrt{km}`,
  String.raw`\delta = \ln(x_1/x_2)`, String.raw`Q = 1/(2\zeta)`, String.raw`E = \tfrac12 k x^2`,
  String.raw`P = c\,\omega^2 X^2/2`, String.raw`\omega_d = \omega_n\sqrt{1-\zeta^2}`,
];

const DISPLAY = [
  String.raw`m\ddot x + c\dot x + kx = 0`,
  String.raw`x(t) = e^{-\zeta\omega_n t}\left[x_0\cos\omega_d t + \frac{v_0+\zeta\omega_n x_0}{\omega_d}\sin\omega_d t\right]`,
  String.raw`\tfrac12 m\dot x^2 + \tfrac12 kx^2 + \int_0^t c\,\dot x^2\,d\tau = \tfrac12 m v_0^2 + \tfrac12 k x_0^2`,
  String.raw`\frac{X}{Y} = \sqrt{\frac{1 + (2\zeta r)^2}{(1-r^2)^2 + (2\zeta r)^2}}`,
  String.raw`\bar P = \frac{1}{T}\int_0^T c\,\dot x^2\,dt = \tfrac12 c\,\omega^2 X^2`,
];

function rng(seed: number): () => number {
  let s = seed >>> 0 || 1;
  return () => { s ^= s << 13; s ^= s >>> 17; s ^= s << 5; return (s >>> 0) / 2 ** 32; };
}

function sentence(r: () => number): string {
  const n = 8 + Math.floor(r() * 10);
  const w = Array.from({ length: n }, () => WORDS[Math.floor(r() * WORDS.length)]!);
  return `${w[0]![0]!.toUpperCase()}${w.join(' ').slice(1)}.`;
}

/** Body: 10 sections, each ~150 words with 2 inline and 1 display equation. */
function body(r: () => number, calculator: boolean): string {
  const parts: string[] = [];
  for (let s = 0; s < 10; s++) {
    parts.push(`## Section ${s + 1}`, '');
    for (let para = 0; para < 2; para++) {
      const sentences = Array.from({ length: 6 }, () => sentence(r));
      sentences[2] = `${sentences[2]!.slice(0, -1)} with $${INLINE[(s * 2 + para) % INLINE.length]}$ in it.`;
      parts.push(sentences.join(' '), '');
    }
    parts.push('$$', DISPLAY[s % DISPLAY.length]!, '$$', '');
    if (calculator && s === 4) parts.push('<Calculator id="sdof" />', '');
  }
  return parts.join('\n');
}

export function benchPage(i: number): { slug: string; dampbook: string; plain: string } {
  const slug = `page-${String(i).padStart(4, '0')}`;
  const title = `Benchmark page ${i + 1}`;
  const front = [
    '---', `id: ${slug}`, `title: ${title}`, 'summary: Generated page for the build-scaling benchmark.', 'topic: Handbook',
    `order: ${i}`, 'revision: A', 'status: draft', 'preparedBy: Wen Hallberg', 'prepared: 2026-11-01', 'calculators: [sdof]', '---', '',
  ].join('\n');
  return {
    slug,
    dampbook: `${front}${body(rng(i + 1), true)}`,
    plain: `---\nlayout: ../../layouts/Plain.astro\ntitle: ${title}\n---\n\n${body(rng(i + 1), false)}`,
  };
}

/** The plain project: Astro + MDX + KaTeX with the same math settings, nothing else. */
export function baselineConfig(): string {
  return `import { defineConfig } from 'astro/config';
import mdx from '@astrojs/mdx';
import remarkMath from 'remark-math';
import rehypeKatex from 'rehype-katex';
export default defineConfig({
  outDir: './dist',
  cacheDir: './.astro-cache',
  markdown: { remarkPlugins: [remarkMath], rehypePlugins: [[rehypeKatex, { output: 'htmlAndMathml', strict: 'warn' }]] },
  integrations: [mdx({ optimize: true })],
  devToolbar: { enabled: false },
});
`;
}

export function baselineLayout(): string {
  return `---
import 'katex/dist/katex.min.css';
const { frontmatter } = Astro.props;
---
<!doctype html>
<html lang="en"><head><meta charset="utf-8" /><title>{frontmatter.title}</title></head>
<body><main><h1>{frontmatter.title}</h1><slot /></main></body></html>
`;
}
