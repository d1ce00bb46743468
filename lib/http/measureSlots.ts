import 'server-only';
import { ApiError } from './api';

/** Measurements one member may have running at once (each is a photo decode and its statistics). */
export const MEASURES_PER_MEMBER = 2;

const running = new Map<string, number>();

/**
 * Runs a measuring request in one of the member's slots; beyond
 * MEASURES_PER_MEMBER at once the request is refused with 429 and Retry-After,
 * so one member cannot fill the worker pool for everyone else.
 */
export async function withMeasureSlot<T>(memberKey: string, run: () => Promise<T>): Promise<T> {
  const n = running.get(memberKey) ?? 0;
  if (n >= MEASURES_PER_MEMBER) {
    throw new ApiError(429, 'too_many_measurements', `You already have ${n} photos being measured; wait for them to finish and try again`, { 'Retry-After': '2' });
  }
  running.set(memberKey, n + 1);
  try {
    return await run();
  } finally {
    const left = (running.get(memberKey) ?? 1) - 1;
    if (left > 0) running.set(memberKey, left);
    else running.delete(memberKey);
  }
}
