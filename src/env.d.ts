/// <reference types="astro/client" />

// tsc alone does not read .astro files (astro's own checker does); this lets .ts modules import them.
declare module '*.astro' {
  import type { AstroComponentFactory } from 'astro/runtime/server/index.js';
  const Component: AstroComponentFactory;
  export default Component;
}

// URLs of the browser bundles (src/build/client-scripts.ts), under the site base.
declare module 'virtual:dampbook/client' {
  const urls: Readonly<Record<import('./build/client-scripts.ts').ClientEntry, string>>;
  export default urls;
  /** Every chunk URL of a lazy module (src/build/client-scripts.ts LAZY_PRELOADS). */
  export const preloads: Readonly<Record<import('./build/client-scripts.ts').LazyPreload, readonly string[]>>;
  /** Calculator id → every chunk URL of its definition (empty in dev). */
  export const calculatorPreloads: Readonly<Record<string, readonly string[]>>;
}

// Every page file of the content folder as its MDX module (src/build/handbook-pages.ts).
declare module 'virtual:dampbook/pages' {
  const files: readonly {
    readonly id: string;
    readonly filePath: string;
    readonly module: {
      default: import('astro/runtime/server/index.js').AstroComponentFactory;
      frontmatter?: unknown;
      getHeadings?: () => import('astro').MarkdownHeading[];
    };
  }[];
  export default files;
}
