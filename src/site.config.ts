/**
 * Handbook identity: shown in the header, on the home page and in every printed sheet header.
 * It comes from the built folder's handbook.config.json (DAMPBOOK_CONTENT, else ./content; see
 * src/content/handbookConfig.ts), so a team's own handbook folder carries its own name, logo,
 * colours and topics and never edits this file. Read once at build time (server side only).
 */
import { topicTitles } from './content/handbookConfig.ts';
import { logoDataUrl, readHandbookConfig } from './content/readHandbookConfig.ts';

const dir = process.env.DAMPBOOK_CONTENT ?? './content';
const config = readHandbookConfig(dir);

export const site = {
  handbook: config.handbook,
  organisation: config.organisation,
  shortOrganisation: config.shortName,
  /** A data: URL of the folder's own logo, or the tool's mark (public/logo.svg, a site path). */
  logo: logoDataUrl(dir, config) ?? 'logo.svg',
  tagline: config.tagline,
  colours: config.colours,
  /** Topic titles in their order (the home page's sections). */
  topics: topicTitles(config),
} as const;

/** The logo's address: a data: URL as it is, a site path under the base. */
export function logoSrc(siteUrl: (path: string) => string): string {
  return site.logo.startsWith('data:') ? site.logo : siteUrl(site.logo);
}

/** The accent colours as CSS custom properties: one inline rule (the CSP allows inline styles), `html:root` so it outranks base.css wherever Astro puts the stylesheet. */
export const accentCss = `html:root{--accent:${site.colours.accent};--accent-ink:${site.colours.accentInk}}`;
