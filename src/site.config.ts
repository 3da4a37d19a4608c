/**
 * Handbook identity: shown in the header, on the home page and in every printed sheet header.
 * An organisation edits this file (and public/logo.svg) to make the handbook its own.
 */
export const site = {
  handbook: 'Dampbook',
  organisation: 'Tarnwick Works — Dynamics & Thermal group',
  shortOrganisation: 'Tarnwick Works',
  logo: 'logo.svg',
  tagline: 'Damper sizing: the damping a system needs, and the heat a damper must shed.',
} as const;
