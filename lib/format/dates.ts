// Dates and times in the shop's own time zone (a team setting), written the
// same on the server, in the browser and on a printed sheet: "12 Mar 2025,
// 14:05". A fixed locale, so a server in another zone or language cannot
// change the figures.
const LOCALE = 'en-GB';

export const DEFAULT_TIME_ZONE = 'UTC';

export function isTimeZone(tz: string): boolean {
  try {
    new Intl.DateTimeFormat(LOCALE, { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}

const zoneOr = (tz: string | null | undefined) => (tz && isTimeZone(tz) ? tz : DEFAULT_TIME_ZONE);

/** "12 Mar 2025, 14:05" in the shop's zone. */
export function formatWhen(at: number, timeZone?: string | null): string {
  return new Intl.DateTimeFormat(LOCALE, { timeZone: zoneOr(timeZone), day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(at);
}

/** "12 Mar 2025" in the shop's zone. */
export function formatDay(at: number, timeZone?: string | null): string {
  return new Intl.DateTimeFormat(LOCALE, { timeZone: zoneOr(timeZone), day: 'numeric', month: 'short', year: 'numeric' }).format(at);
}

/** Every IANA zone this runtime knows, UTC first. */
export function timeZoneList(): string[] {
  const all = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return [DEFAULT_TIME_ZONE, ...all.filter((z) => z !== DEFAULT_TIME_ZONE)];
}
