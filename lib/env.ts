import { z } from 'zod';

// Settings parsed once, at start-up. Defaults are the local stand-ins.
const schema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  DATABASE_URL: z.string().min(1).default('./data/pourproof.db'),
  APP_URL: z.string().url().optional(),
  SMTP_URL: z.string().default('smtp://127.0.0.1:2525'),
  MAIL_FROM: z.string().default('Pourproof <no-reply@pourproof.test>'),
  MAIL_STANDIN: z.enum(['0', '1']).default('1'),
  SECURE_COOKIES: z.enum(['auto', '0', '1']).default('auto'),
  SESSION_IDLE_DAYS: z.coerce.number().positive().default(14),
  SESSION_ABSOLUTE_DAYS: z.coerce.number().positive().default(30),
  SIGN_IN_MAX_FAILURES: z.coerce.number().int().positive().default(10),
  SIGN_IN_WINDOW_MIN: z.coerce.number().positive().default(15),
});

export type Env = z.infer<typeof schema>;

let cached: Env | undefined;

export function env(): Env {
  if (!cached) {
    const parsed = schema.safeParse(process.env);
    if (!parsed.success) {
      throw new Error(`Bad environment: ${parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
    }
    cached = parsed.data;
  }
  return cached;
}
