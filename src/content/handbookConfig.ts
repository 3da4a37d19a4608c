/**
 * A handbook folder's own settings (`handbook.config.json` beside its topic folders): who the
 * handbook belongs to, its logo and accent colours, and its topics. The zod schema is the one
 * definition of the file; every refusal is one line naming the field. Pure: the file is read by
 * readHandbookConfig.ts.
 */
import { z } from 'zod';
import { DampbookError } from '../core/errors.ts';

export const CONFIG_FILE = 'handbook.config.json';

/** The config file is missing a field or holds a bad value; the message names the field. */
export class HandbookConfigError extends DampbookError {
  override name = 'HandbookConfigError';
}

const HEX = /^#[0-9a-fA-F]{6}$/;

/** WCAG 2.1 relative luminance of an sRGB colour "#rrggbb" (SC 1.4.3, definition of relative luminance). */
export function relativeLuminance(hex: string): number {
  const channel = (i: number) => {
    const c = parseInt(hex.slice(1 + 2 * i, 3 + 2 * i), 16) / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * channel(0) + 0.7152 * channel(1) + 0.0722 * channel(2);
}

/** Contrast ratio (L1 + 0.05) / (L2 + 0.05) of a colour against white (WCAG 2.1, contrast ratio). */
export function contrastOnWhite(hex: string): number {
  return 1.05 / (relativeLuminance(hex) + 0.05);
}

/** A colour that must reach `min`:1 against the white page (text 4.5, SC 1.4.3; graphics 3, SC 1.4.11). */
const colour = (min: number, what: string) => z.string().regex(HEX, 'a hex colour such as #7c3a1b').refine((c) => contrastOnWhite(c) >= min, (c) => ({
  message: `${c} has contrast ${contrastOnWhite(c).toFixed(2)}:1 against white; ${what} needs at least ${min}:1 (WCAG 2.1 SC ${min === 4.5 ? '1.4.3' : '1.4.11'})`,
}));

const topicSchema = z.object({
  /** The topic's folder name under the handbook folder (`dampbook new <id>/<page>` writes there). */
  id: z.string().regex(/^[a-z0-9][a-z0-9-]*$/, 'a folder name: lower-case letters, digits and hyphens'),
  /** What a page's frontmatter `topic:` says and the home page shows. */
  title: z.string().min(2),
  order: z.number().int(),
}).strict();

export const handbookConfigSchema = z.object({
  handbook: z.string().min(1).default('Dampbook'),
  organisation: z.string().min(2),
  shortName: z.string().min(2),
  tagline: z.string().min(10).default('Damper sizing: the damping a system needs, and the heat a damper must shed.'),
  /** An SVG or PNG file in the handbook folder; without it the tool's own mark is shown. */
  logo: z.string().regex(/^[^/\\][^\\]*\.(svg|png)$/i, 'a .svg or .png file inside the handbook folder').refine((p) => !p.split('/').includes('..'), 'a file inside the handbook folder (no ..)').optional(),
  colours: z.object({
    /** Rules, borders and caution marks (a graphic: 3:1). */
    accent: colour(3, 'an accent').default('#a4512a'),
    /** Links and small headings (text: 4.5:1). */
    accentInk: colour(4.5, 'text').default('#7c3a1b'),
  }).strict().default({}),
  topics: z.array(topicSchema).min(1, 'at least one topic'),
}).strict().superRefine((c, ctx) => {
  const seen = new Map<string, number>();
  c.topics.forEach((t, i) => {
    for (const key of [`id ${t.id}`, `title ${t.title}`]) {
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['topics', i], message: `topic ${key.replace(' ', " '")}' is given twice (also topics.${seen.get(key)})` });
      seen.set(key, i);
    }
  });
});

export type HandbookConfig = z.infer<typeof handbookConfigSchema>;

/** Parses the file's JSON text; throws HandbookConfigError "<file>: <field>: <problem>". */
export function parseHandbookConfig(text: string, file: string): HandbookConfig {
  let data: unknown;
  try { data = JSON.parse(text); } catch (e) { throw new HandbookConfigError(`${file}: not valid JSON (${e instanceof Error ? e.message.split('\n')[0] : String(e)})`); }
  const r = handbookConfigSchema.safeParse(data);
  if (!r.success) {
    const i = r.error.issues[0]!;
    throw new HandbookConfigError(`${file}: ${i.path.join('.') || '(file)'}: ${i.message}`);
  }
  return r.data;
}

/** Topic titles in their order: what a page's `topic:` may say. */
export function topicTitles(c: HandbookConfig): string[] {
  return [...c.topics].sort((a, b) => a.order - b.order).map((t) => t.title);
}
