import { db } from '@/db';
import { setSessionCookie } from '@/lib/auth/cookie';
import { createUserSession } from '@/lib/auth/session';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertAccountCreationAllowed } from '@/lib/auth/throttle';
import { assertSameOrigin, clientIp } from '@/lib/http/origin';
import { signUp } from '@/lib/team/signUp';
import { signUpSchema } from '@/lib/validations/auth';

export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const input = await readJson(req, signUpSchema);
  assertAccountCreationAllowed(db(), clientIp(req));
  const member = await signUp(db(), input);
  const { token } = await createUserSession(db(), member.user.id);
  await setSessionCookie(token);
  return json(member, 201);
});
