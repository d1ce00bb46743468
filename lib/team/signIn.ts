import 'server-only';
import { eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { getMemberByUserId, type Member } from '@/db/queries/members';
import { users } from '@/db/schema';
import { dummyHash, verifyPassword } from '@/lib/auth/password';
import { createUserSession } from '@/lib/auth/session';
import { clearPairFailures, recordFailure, retryAfterSeconds, throttleKeys } from '@/lib/auth/throttle';
import { ApiError } from '@/lib/http/api';
import type { SignInInput } from '@/lib/validations/auth';

const WRONG = 'E-mail or password is wrong';

// Checks the password (argon2id), throttled per account and address
// (lib/auth/throttle.ts), and one message for unknown e-mail and wrong password alike.
export async function signIn(database: DB, input: SignInInput, ip: string | null): Promise<{ member: Member; token: string }> {
  const keys = throttleKeys(input.email, ip);
  const wait = retryAfterSeconds(database, keys);
  if (wait > 0) {
    throw new ApiError(429, 'too_many_attempts', `Too many failed sign-ins; try again in ${wait < 90 ? `${wait} s` : `${Math.ceil(wait / 60)} min`}`, {
      'Retry-After': String(wait),
    });
  }
  const user = database.select().from(users).where(eq(users.email, input.email)).get();
  const ok = user ? await verifyPassword(user.passwordHash, input.password) : (await verifyPassword(await dummyHash(), input.password), false);
  const member = ok && user ? getMemberByUserId(database, user.id) : null;
  if (!member) {
    recordFailure(database, keys);
    throw new ApiError(401, 'invalid_credentials', WRONG);
  }
  clearPairFailures(database, keys);
  const { token } = await createUserSession(database, member.user.id);
  return { member, token };
}
