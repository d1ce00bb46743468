// What makers type into a dose or batch-size box, as they say it: "1/2",
// "1 1/4", "¼", "1¼", "0,5", "0.5", "2". One parser for every amount field
// (pour, batch, calculator) and the server, so "1/2" never becomes 12.
// A comma is a decimal mark (as on phones set to many European locales), not
// a thousands separator: nobody doses a thousand drops per cup.

export type ParsedAmount = { ok: true; value: number } | { ok: false; message: string };

const VULGAR: Record<string, number> = {
  '½': 1 / 2, '⅓': 1 / 3, '⅔': 2 / 3, '¼': 1 / 4, '¾': 3 / 4, '⅕': 1 / 5, '⅖': 2 / 5, '⅗': 3 / 5, '⅘': 4 / 5,
  '⅙': 1 / 6, '⅚': 5 / 6, '⅛': 1 / 8, '⅜': 3 / 8, '⅝': 5 / 8, '⅞': 7 / 8,
};
const DECIMAL = /^\d+(?:[.,]\d+)?$|^[.,]\d+$/;
const FRACTION = /^(\d+)\s*[/⁄]\s*(\d+)$/;
const HELP = 'type a number such as 2, 0.5, 1/2, 1 1/4 or ¼';

function parsePart(part: string): number | string {
  if (DECIMAL.test(part)) return Number(part.replace(',', '.'));
  const f = FRACTION.exec(part);
  if (f) {
    const den = Number(f[2]);
    if (den === 0) return `"${part}" divides by zero`;
    return Number(f[1]) / den;
  }
  if (part.length === 1 && part in VULGAR) return VULGAR[part]!;
  return `"${part}" is not an amount: ${HELP}`;
}

export function parseAmount(text: string | number | null | undefined): ParsedAmount {
  if (typeof text === 'number') {
    return Number.isFinite(text) ? { ok: true, value: text } : { ok: false, message: `not an amount: ${HELP}` };
  }
  // Vulgar fractions may follow a whole number directly ("1¼") or after a space.
  const s = (text ?? '').trim().replace(/(\d)([½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅛⅜⅝⅞])/g, '$1 $2');
  if (!s) return { ok: false, message: `no amount given: ${HELP}` };
  if (s.startsWith('-')) return { ok: false, message: 'an amount cannot be negative' };
  const parts = s.split(/\s+/);
  if (parts.length > 2) return { ok: false, message: `"${s}" is not an amount: ${HELP}` };
  const values = parts.map(parsePart);
  const bad = values.find((v): v is string => typeof v === 'string');
  if (bad) return { ok: false, message: bad };
  const [whole, frac] = values as number[];
  if (frac === undefined) return { ok: true, value: whole! };
  // "1 1/4" is a whole number and a proper fraction; "1.5 1/2" or "1 5/4" is a slip.
  if (!Number.isInteger(whole) || !(frac < 1) || !/[/⁄½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅛⅜⅝⅞]/.test(parts[1]!)) {
    return { ok: false, message: `"${s}" is not an amount: ${HELP}` };
  }
  return { ok: true, value: whole! + frac };
}
