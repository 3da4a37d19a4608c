/**
 * What the search indexer is handed of a page: the HTML without its KaTeX markup.
 *
 * Why: the index leaves `.katex` out anyway (SEARCH_EXCLUDE in search-index.ts: TeX source and
 * MathML are not prose), but on a math-heavy page that markup is some 70 % of the HTML (118 of
 * 167 KB on a build-benchmark page). Handing it over cost the build's main thread its JSON and
 * base64 encoding, and the indexer its parsing, for nothing. The index is the same either way
 * (its files compared byte for byte on the demo handbook).
 */

const OPEN = '<span class="katex">';

/**
 * `html` with every `<span class="katex">…</span>` (KaTeX's root element, exactly as KaTeX writes
 * it) removed, nested spans matched. A span whose end cannot be found is left in place, and so is
 * everything after it: the indexer's own exclusion still applies there.
 */
export function withoutKatex(html: string): string {
  let at = html.indexOf(OPEN);
  if (at < 0) return html;
  const kept: string[] = [];
  let from = 0;
  while (at >= 0) {
    let depth = 0;
    let j = at;
    let open = html.indexOf('<span', j);
    for (;;) {
      const close = html.indexOf('</span>', j);
      if (close < 0) { kept.push(html.slice(from)); return kept.join(''); }
      if (open >= 0 && open < close) { depth++; j = open + 5; open = html.indexOf('<span', j); continue; }
      depth--;
      j = close + 7;
      if (depth === 0) break;
    }
    kept.push(html.slice(from, at));
    from = j;
    at = html.indexOf(OPEN, j);
  }
  kept.push(html.slice(from));
  return kept.join('');
}
