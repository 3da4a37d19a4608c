/** URL of a handbook page from its collection entry id ("oscillators/sdof"), under the site base. */
export function pageUrl(entryId: string): string {
  const base = import.meta.env.BASE_URL.endsWith('/') ? import.meta.env.BASE_URL : `${import.meta.env.BASE_URL}/`;
  return `${base}${entryId}/`;
}

/** URL of a site path ("pagefind/") under the site base. */
export function siteUrl(path: string): string {
  const base = import.meta.env.BASE_URL.endsWith('/') ? import.meta.env.BASE_URL : `${import.meta.env.BASE_URL}/`;
  return `${base}${path.replace(/^\//, '')}`;
}
