'use client';

import { createContext, useContext } from 'react';
import { DEFAULT_TIME_ZONE, formatDay, formatWhen } from '@/lib/format/dates';

// The shop's time zone (a team setting), given once by the bench layout, so
// every date on every page reads in it — not in the server's or the phone's.
const ShopTimeZone = createContext<string>(DEFAULT_TIME_ZONE);

export function ShopTimeZoneProvider({ timeZone, children }: { timeZone: string; children: React.ReactNode }) {
  return <ShopTimeZone.Provider value={timeZone}>{children}</ShopTimeZone.Provider>;
}

export const useShopTimeZone = () => useContext(ShopTimeZone);

/** A date (and time) in the shop's zone, in a <time> element. */
export function When({ at, dayOnly = false }: { at: number; dayOnly?: boolean }) {
  const tz = useShopTimeZone();
  return <time dateTime={new Date(at).toISOString()}>{dayOnly ? formatDay(at, tz) : formatWhen(at, tz)}</time>;
}
