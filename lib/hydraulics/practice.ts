/**
 * Rules of practice the calculators apply, each with the source the product
 * can show beside it. Where no published source was found the `source` says
 * so plainly ("common practice, no published source found"): the number is
 * still the one the engine uses, so the guides must quote the same one.
 */

export interface PracticeRule {
  value: number;
  /** shown in the product beside the number */
  source: string;
}

const NONE = 'common practice, no published source found';

/**
 * The settled values. Falls: Water for the World RWS.4.D.5 gives 0.5 m as the
 * least a ram needs; a fall at or below it is rarely viable. Drive pipe length
 * 5–10 times the fall: the range ram guides repeat, no published source found
 * (the Building Trades Pocketbook gives 25–50 ft of drive pipe instead of a
 * ratio, kept beside it). Share of the source: at most half the dry-month flow
 * through the pumps. Delivery-line loss: 10 % of the lift by default.
 */
export const PRACTICE = {
  minFallM: {
    value: 0.5,
    source: 'Water for the World RWS.4.D.5 (USAID), 0.5 m least fall (from memory; the note was not found)',
  },
  driveLengthToFallMin: { value: 5, source: NONE },
  driveLengthToFallMax: { value: 10, source: NONE },
  driveLengthMinM: {
    value: 7.62,
    source: 'Building Trades Pocketbook (International Textbook Co., 1899–1905): drive pipe 25 to 50 ft',
  },
  driveLengthMaxM: {
    value: 15.24,
    source: 'Building Trades Pocketbook (International Textbook Co., 1899–1905): drive pipe 25 to 50 ft',
  },
  sourceShareCaution: { value: 0.5, source: `${NONE}: leave at least half the dry-month flow in the stream` },
  deliveryLossShare: { value: 0.1, source: `${NONE}: delivery-line friction up to a tenth of the lift` },
  ratingMargin: { value: 1.5, source: NONE },
  beatsPerMinuteMin: { value: 40, source: NONE },
  beatsPerMinuteMax: { value: 120, source: NONE },
  vNotchMinHeadM: {
    value: 0.06096,
    source: 'USBR Water Measurement Manual, ch. 7: head at least 0.2 ft (61 mm) (from memory)',
  },
} as const satisfies Record<string, PracticeRule>;

/**
 * Whether a fall is too small for a ram to be worth building: at or below PRACTICE.minFallM.
 * Units: m. Reference: PRACTICE.minFallM.
 * @example the boundary itself warns now (it did not before)
 * fallRarelyViable(0.5)  // → true
 * fallRarelyViable(0.51)  // → false
 */
export function fallRarelyViable(fallM: number): boolean {
  return fallM <= PRACTICE.minFallM.value;
}
