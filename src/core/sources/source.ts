/** One entry of the bibliography. */
export interface Source {
  /** Full citation as it appears on a printed sheet. */
  readonly citation: string;
  readonly kind: 'book' | 'standard' | 'paper' | 'report' | 'data';
}
