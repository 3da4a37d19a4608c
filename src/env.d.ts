/// <reference types="astro/client" />

// tsc alone does not read .astro files (astro's own checker does); this lets .ts modules import them.
declare module '*.astro' {
  import type { AstroComponentFactory } from 'astro/runtime/server/index.js';
  const Component: AstroComponentFactory;
  export default Component;
}
