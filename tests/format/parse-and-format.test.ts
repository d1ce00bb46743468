import { describe, expect, it } from 'vitest';
import { formatCups, formatDay, formatDeltaE, formatDose, formatLab, formatMl, formatShare, formatSigned, formatTemp, formatWhen, spoonFraction } from '../../lib/format';
import { ML_PER_TSP, convertDose, parseAmount } from '../../lib/recipes';

const value = (s: string | number) => {
  const r = parseAmount(s);
  if (!r.ok) throw new Error(`${s}: ${r.message}`);
  return r.value;
};
const refused = (s: string) => {
  const r = parseAmount(s);
  expect(r.ok, s).toBe(false);
  return r.ok ? '' : r.message;
};

describe('parseAmount: doses as makers type them', () => {
  it('reads fractions, mixed numbers, vulgar fractions and both decimal marks', () => {
    const cases: [string, number][] = [
      ['1/2', 0.5], ['1 1/4', 1.25], ['¼', 0.25], ['0,5', 0.5], ['0.5', 0.5], ['2', 2], [' 3 ', 3],
      ['1¼', 1.25], ['1 ½', 1.5], ['3/8', 0.375], ['1/32', 0.03125], ['.5', 0.5], [',25', 0.25], ['12', 12], ['1⁄2', 0.5], ['2 3/4', 2.75],
    ];
    for (const [text, v] of cases) expect(value(text), text).toBeCloseTo(v, 12);
  });
  it('passes finite numbers through (values set by code, e.g. a suggested dose)', () => {
    expect(value(0.75)).toBe(0.75);
    expect(parseAmount(Number.NaN).ok).toBe(false);
  });
  it('refuses what is not an amount, with a message that says why', () => {
    expect(refused('1/0')).toMatch(/divides by zero/);
    expect(refused('abc')).toMatch(/"abc" is not an amount: type a number such as 2, 0\.5, 1\/2/);
    expect(refused('')).toMatch(/no amount given/);
    expect(refused('-1')).toMatch(/negative/);
    for (const s of ['1/2/3', '1.5 1/2', '1 5/4', '1 2', '1,000.5', '1.2.3', '2 drops', 'one', '1 1/2 1/4', '½½', '0x10', '1e3', 'Infinity']) refused(s);
  });
  it('never reads "1/2" as 12 (the bug this parser replaced)', () => {
    expect(value('1/2')).not.toBe(12);
  });
});

describe('convertDose: exact conversions only', () => {
  it('converts drops and mL through the dropper setting, and tsp by 1/48 cup', () => {
    expect(convertDose(1, 'ml', 'drops', 20)).toBeCloseTo(20, 12);
    expect(convertDose(10, 'drops', 'ml', 20)).toBeCloseTo(0.5, 12);
    expect(convertDose(10, 'drops', 'ml', 25)).toBeCloseTo(0.4, 12);
    // 1 tsp = 1/48 cup = 4.92892159375 mL (NIST Handbook 44, Appendix C).
    expect(convertDose(1, 'tsp', 'ml', 20)).toBeCloseTo(4.92892159375, 10);
    expect(convertDose(ML_PER_TSP, 'ml', 'tsp', 20)).toBeCloseTo(1, 12);
    expect(convertDose(1, 'tsp', 'drops', 20)).toBeCloseTo(98.578431875, 8);
    expect(convertDose(3, 'g', 'g', 20)).toBe(3);
  });
  it('refuses grams to or from a volume (no density)', () => {
    expect(convertDose(1, 'g', 'ml', 20)).toBeNull();
    expect(convertDose(1, 'drops', 'g', 20)).toBeNull();
  });
});

describe('formatters: one way to write a figure', () => {
  it('writes doses on the bench steps, singular for one, teaspoons with the spoon fraction', () => {
    expect(formatDose(1, 'drops')).toBe('1 drop');
    expect(formatDose(6, 'drops')).toBe('6 drops');
    expect(formatDose(2.5, 'drops')).toBe('2.5 drops');
    expect(formatDose(1.25, 'drops')).toBe('1.25 drops');
    expect(formatDose(0.125, 'tsp')).toBe('0.125 tsp (⅛ tsp)');
    expect(formatDose(0.5, 'tsp')).toBe('0.5 tsp (½ tsp)');
    expect(formatDose(1.25, 'tsp')).toBe('1.25 tsp (1 ¼ tsp)');
    expect(formatDose(1 / 32, 'tsp')).toBe('0.031 tsp (1/32 tsp)');
    expect(formatDose(1, 'tsp')).toBe('1 tsp');
    expect(formatDose(0.3, 'tsp')).toBe('0.3 tsp');
    expect(formatDose(1.5, 'g')).toBe('1.5 g');
    expect(formatDose(2.456, 'ml')).toBe('2.46 mL');
    expect(spoonFraction(0.124)).toBe('⅛ tsp');
    expect(spoonFraction(0.14)).toBeNull();
  });
  it('writes volumes, ΔE00, Lab and temperature with the brief’s decimals', () => {
    expect(formatMl(236.5882365)).toBe('236.6 mL');
    expect(formatMl(19.96)).toBe('20 mL');
    expect(formatCups(1)).toBe('1 cup');
    expect(formatCups(2.5)).toBe('2.5 cups');
    expect(formatDeltaE(1.234)).toBe('1.2');
    expect(formatDeltaE(1.234, 'detail')).toBe('1.23');
    expect(formatDeltaE(2, 'detail')).toBe('2.00');
    expect(formatLab({ l: 38, a: -10.04, b: 22.05 })).toBe('L* 38.0 a* -10.0 b* 22.1');
    // (340 − 32) × 5/9 = 171.1 °C
    expect(formatTemp(340)).toBe('340 °F (171 °C)');
    // Shares and signed differences with their ± when there is one.
    expect(formatShare(0.1234, 0.0301)).toBe('12.3 % ± 3.0 %');
    expect(formatShare(0.1234)).toBe('12.3 %');
    expect(formatShare(0.1234, null)).toBe('12.3 %');
    expect(formatSigned(-1.204, 0.396)).toBe('−1.20 ± 0.40');
    expect(formatSigned(0.5)).toBe('+0.50');
  });
  it('writes dates in the shop’s time zone, whatever the server’s', () => {
    const at = Date.UTC(2025, 2, 12, 14, 5);
    expect(formatWhen(at, 'UTC')).toBe('12 Mar 2025, 14:05');
    // America/Chicago is UTC−5 on 12 March 2025 (daylight time began 9 March; IANA tz database).
    expect(formatWhen(at, 'America/Chicago')).toBe('12 Mar 2025, 09:05');
    expect(formatDay(Date.UTC(2025, 2, 12, 2, 0), 'America/Chicago')).toBe('11 Mar 2025');
    expect(formatWhen(at, 'Not/AZone')).toBe('12 Mar 2025, 14:05');
  });
});
