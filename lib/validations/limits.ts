// Ceilings of sign-off and production fields, without zod, so a form that only shows a limit does
// not carry the schema library to the browser. They are sanity limits against typing slips, not
// shop limits: 400 cups is 25 gallons of plastisol.

export const MAX_COMMENT = 2000;
export const MAX_BATCH_CUPS = 400;
export const MAX_BAITS = 100_000;
