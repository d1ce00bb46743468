import { db } from '@/db';
import { clearSessionCookie, readSessionToken } from '@/lib/auth/cookie';
import { invalidateSessionToken } from '@/lib/auth/session';
import { json, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';

export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const token = await readSessionToken();
  if (token) await invalidateSessionToken(db(), token);
  await clearSessionCookie();
  return json({ ok: true });
});
