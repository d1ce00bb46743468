import { db } from '@/db';
import { setSessionCookie } from '@/lib/auth/cookie';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin, clientIp } from '@/lib/http/origin';
import { signIn } from '@/lib/team/signIn';
import { signInSchema } from '@/lib/validations/auth';

export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const input = await readJson(req, signInSchema);
  const { member, token } = await signIn(db(), input, clientIp(req));
  await setSessionCookie(token);
  return json(member);
});
