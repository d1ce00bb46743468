// The answer of GET /api/pours/:id/suggestion (API.md "ZoneAdvice"), shared with the pour form.
import type { DoseUnit } from '@/db/schema';

export interface AdviceChange {
  colorantId: string;
  colorant: string;
  unit: DoseUnit;
  from: number;
  to: number;
}

export interface ZoneSuggestion {
  zone: string;
  status: 'within_tolerance' | 'suggested' | 'no_history';
  dE00: number;
  changes: AdviceChange[];
  predicted: { lab: { l: number; a: number; b: number }; dE00: number } | null;
  reason: string | null;
  /** What the advice learnt from, in words ("7 pours with reed green …"); null when nothing was learnt. */
  learntFrom: string | null;
  /** Colorants of the zone the shop must calibrate (or vary) before the model moves them. */
  toCalibrate: { colorantId: string; colorant: string }[];
}

export interface PourSuggestion {
  pourId: string;
  number: number;
  zones: ZoneSuggestion[];
}
