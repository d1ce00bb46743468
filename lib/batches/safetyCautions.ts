// The cautions shown wherever the app tells someone to heat, pour or inject
// plastisol (recipe sheets, batch sheets, the temperature field). Written
// plainly, each with its source named as in PRODUCT.md ("Safety" and "Trade
// facts for checks and cautions"); notes without a published source say
// "common practice". Plain strings, so the UI, the print sheet and the API
// can share them as they are.

const PLASTISOL_PAGE = 'homemadetackle.com, "Plastisol"';
const BEGINNER_GUIDE = 'plasticranger.com, "How to Make Soft Plastic Fishing Lures: A Beginner\'s Guide"';
const POUR_GUIDE = 'thelureforum.com, "How to pour soft plastic lures"';

/** The usual pouring range (homemadetackle.com, "Plastisol"; plasticranger.com, same guide). */
export const PLASTISOL_TEMP_F = { low: 325, high: 350 } as const;

export const TEMPERATURE_CAUTION =
  `Heat plastisol to about ${PLASTISOL_TEMP_F.low}–${PLASTISOL_TEMP_F.high} °F (${PLASTISOL_PAGE}; ${BEGINNER_GUIDE}), ` +
  `about 170 °C (${POUR_GUIDE}), and stay within the plastisol maker's temperature range.`;

export const SAFETY_CAUTIONS: readonly string[] = [
  'Heated plastisol burns and gives off fumes. Follow the product\'s safety data sheet and local codes first.',
  `Wear heat-resistant gloves, long sleeves and eye protection (goggles) when heating, pouring or injecting (${POUR_GUIDE}).`,
  `Work with good ventilation, and wear a respirator where the product's safety data sheet asks for one (${POUR_GUIDE}).`,
  `Use equipment only for plastisol, never for food: a microwave that heats plastisol is never used for food again (${POUR_GUIDE}).`,
  TEMPERATURE_CAUTION,
  `Heated unevenly or too far, plastisol yellows, browns or burns (${PLASTISOL_PAGE}).`,
];

export const TRADE_NOTES: readonly string[] = [
  `Softener or hardener is added at roughly 10–20 % (${POUR_GUIDE}); salt at 0–10 % (${BEGINNER_GUIDE}).`,
  'Inject at the low end of the temperature range to keep laminates even (common practice).',
  'Flake settles in the cup: stir between shots (common practice).',
  'A cold-water bath sets baits faster, but clouds them if they stay in much past 10–15 minutes (common practice).',
  'Thin-bodied molds show a lighter overall colour for the same recipe, so makers dose more pigment for them (common practice).',
];

/** Everything a batch sheet prints, cautions first. */
export const BATCH_SHEET_CAUTIONS: readonly string[] = [...SAFETY_CAUTIONS, ...TRADE_NOTES];

// A plain note on a pour's recorded temperature against the usual range; it
// never forbids anything, the plastisol maker's range decides.
export function temperatureNote(tempF: number | null): string | null {
  if (tempF === null) return null;
  if (tempF < PLASTISOL_TEMP_F.low) return `${tempF} °F is below the usual ${PLASTISOL_TEMP_F.low}–${PLASTISOL_TEMP_F.high} °F: check the plastisol fuses fully.`;
  if (tempF > PLASTISOL_TEMP_F.high) return `${tempF} °F is above the usual ${PLASTISOL_TEMP_F.low}–${PLASTISOL_TEMP_F.high} °F: check the plastisol maker's range; too hot, it yellows or burns.`;
  return null;
}
