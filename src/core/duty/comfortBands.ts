/**
 * The likely reaction of passengers to an overall weighted vibration value (ISO 2631-1:1997
 * Annex C, public transport), as text. The bands overlap in the standard; a value in an overlap
 * is given both names.
 */
import { NON_NEGATIVE, requireInRange } from '../errors.ts';

/** [lower, upper) m/s² and the reaction (ISO 2631-1:1997 Annex C.2.3, from memory). */
export const COMFORT_BANDS: readonly { readonly from: number; readonly to: number; readonly reaction: string }[] = [
  { from: 0, to: 0.315, reaction: 'not uncomfortable' },
  { from: 0.315, to: 0.63, reaction: 'a little uncomfortable' },
  { from: 0.5, to: 1, reaction: 'fairly uncomfortable' },
  { from: 0.8, to: 1.6, reaction: 'uncomfortable' },
  { from: 1.25, to: 2.5, reaction: 'very uncomfortable' },
  { from: 2, to: Infinity, reaction: 'extremely uncomfortable' },
];

/**
 * Reaction named for a weighted rms acceleration a_w (every band that holds it, joined by "to").
 *
 * @param aw overall weighted rms acceleration, m/s², ≥ 0
 * @throws InputRangeError naming aw
 * @example comfortReaction(0.55) // 'a little uncomfortable to fairly uncomfortable'
 * @source iso2631_1 Annex C.2.3 comfort reactions in public transport (from memory)
 */
export function comfortReaction(aw: number): string {
  requireInRange('aw', aw, NON_NEGATIVE, 'm/s²');
  const hit = COMFORT_BANDS.filter((b) => aw >= b.from && aw < b.to).map((b) => b.reaction);
  return hit.length > 1 ? `${hit[0]} to ${hit[hit.length - 1]}` : hit[0]!;
}
