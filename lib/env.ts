import { z } from 'zod';

// Every setting, parsed once with zod; instrumentation.ts parses at start-up
// so a bad value stops the server instead of surfacing later.
const schema = z.object({
  DATABASE_URL: z.string().min(1).default('./data/pourproof.db'),
  APP_URL: z.url().optional(),
  SMTP_URL: z.string().min(1).default('smtp://127.0.0.1:2525'),
  MAIL_FROM: z.string().min(3).default('Pourproof <no-reply@pourproof.test>'),
  MAIL_FAKE_URL: z.url().optional(),
  MAIL_RETRY_MS: z.coerce.number().int().min(100).default(5000),
  POURPROOF_DEV_TOOLS: z.enum(['0', '1']).default('0'),
  SECURE_COOKIES: z.enum(['auto', '0', '1']).default('auto'),
  SESSION_IDLE_DAYS: z.coerce.number().positive().default(14),
  SESSION_ABSOLUTE_DAYS: z.coerce.number().positive().default(30),
  SIGN_IN_MAX_FAILURES: z.coerce.number().int().positive().default(10),
  SIGN_IN_WINDOW_MIN: z.coerce.number().positive().default(15),
  // The upload service (UploadThing SDK). The SDK reads these itself; they are
  // listed here so a malformed value stops the server at start-up.
  UPLOADTHING_TOKEN: z.string().min(1).optional(),
  UPLOADTHING_INGEST_URL: z.url().optional(),
  UPLOADTHING_API_URL: z.url().optional(),
  UPLOADTHING_UFS_HOST: z.string().min(1).optional(),
  UPLOADTHING_UFS_APP_ID_LOCATION: z.enum(['subdomain', 'path']).optional(),
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

// Tests change settings between cases; the app never calls this.
export function resetEnvForTests() {
  cached = undefined;
}
