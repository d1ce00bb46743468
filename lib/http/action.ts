import 'server-only';
import { headers } from 'next/headers';
import { unstable_rethrow } from 'next/navigation';
import { z } from 'zod';
import type { Member } from '@/db/queries/members';
import type { Role } from '@/db/schema';
import { requireRole } from '@/lib/auth/current';
import { ApiError } from './api';
import { assertSameOriginHeaders, clientIpFrom } from './origin';

/** The one state every server action answers with (useActionState on the page). */
export type ActionState = { ok: boolean; message?: string; fieldErrors?: Partial<Record<string, string[]>> } | null;

export type ActionRefusal = { ok: false; message: string };

/** A form that failed its zod schema, as the action's state: each field's messages. */
export function invalidForm(error: z.ZodError): ActionState {
  return { ok: false, fieldErrors: z.flattenError(error).fieldErrors as Partial<Record<string, string[]>> };
}

/**
 * The door of every server action, as `withApi` is of every route handler:
 * refuses a missing or foreign Origin (Next checks a server action's Origin
 * only when the browser sends one), asks for the member's role when one is
 * needed, and turns any refusal (ApiError: 401, 403, 404, 409, 429…) into the
 * action's own error state, shown on the page — never an HTTP 500.
 */
export async function guardedAction<S>(
  needed: Role | null,
  run: (ctx: { member: Member | null; ip: string | null }) => Promise<S>,
): Promise<S | ActionRefusal> {
  try {
    const h = await headers();
    assertSameOriginHeaders(h);
    const member = needed ? await requireRole(needed) : null;
    return await run({ member, ip: clientIpFrom(h) });
  } catch (err) {
    unstable_rethrow(err);
    if (err instanceof ApiError) return { ok: false, message: err.message };
    throw err;
  }
}
