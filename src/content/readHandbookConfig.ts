/**
 * Reads a handbook folder's `handbook.config.json` (the site build, the CLI). A folder without the
 * file is refused with a message saying what to write: topics and the organisation have no
 * sensible default for someone else's handbook.
 */
import { existsSync, readFileSync, statSync } from 'node:fs';
import { extname, join, resolve } from 'node:path';
import { CONFIG_FILE, HandbookConfigError, parseHandbookConfig, type HandbookConfig } from './handbookConfig.ts';

/** Largest logo inlined into pages and sheets (a logo is a small mark, not a photograph). */
const MAX_LOGO_BYTES = 256 * 1024;

export function readHandbookConfig(contentDir: string): HandbookConfig {
  const file = join(contentDir, CONFIG_FILE);
  if (!existsSync(file)) throw new HandbookConfigError(`${file}: no such file; a handbook folder needs one (organisation, shortName, topics; see README "Your own handbook")`);
  if (statSync(file).size > 1024 * 1024) throw new HandbookConfigError(`${file}: larger than 1 MB; it holds settings only`);
  return parseHandbookConfig(readFileSync(file, 'utf8'), file);
}

/**
 * The logo as a data: URL (the pages' Content-Security-Policy allows data: images), or undefined
 * when the config names none.
 * @throws HandbookConfigError naming `logo` when the file is missing or too large
 */
export function logoDataUrl(contentDir: string, config: HandbookConfig): string | undefined {
  if (!config.logo) return undefined;
  const file = resolve(contentDir, config.logo);
  if (!existsSync(file)) throw new HandbookConfigError(`${join(contentDir, CONFIG_FILE)}: logo: ${config.logo} is not a file in the handbook folder`);
  const bytes = readFileSync(file);
  if (bytes.length > MAX_LOGO_BYTES) throw new HandbookConfigError(`${join(contentDir, CONFIG_FILE)}: logo: ${config.logo} is ${Math.round(bytes.length / 1024)} KB; a logo may be at most 256 KB`);
  const type = extname(file).toLowerCase() === '.svg' ? 'image/svg+xml' : 'image/png';
  return `data:${type};base64,${bytes.toString('base64')}`;
}
