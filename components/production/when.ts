// Dates and times as a bench reads them: "12 Mar 2025, 14:05" in the
// browser's own locale and time zone.
export function when(at: number): string {
  return new Date(at).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

export function day(at: number): string {
  return new Date(at).toLocaleDateString(undefined, { dateStyle: 'medium' });
}
