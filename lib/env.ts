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
  // Sign-in throttling (lib/auth/throttle.ts): failures of one account from one
  // address before that pair is slowed down; failures of one address across
  // accounts before the address is slowed down; failures of one account across
  // addresses before only addresses that have not failed on it may try.
  SIGN_IN_PAIR_FAILURES: z.coerce.number().int().positive().default(5),
  SIGN_IN_ADDRESS_FAILURES: z.coerce.number().int().positive().default(30),
  SIGN_IN_MAX_FAILURES: z.coerce.number().int().positive().default(10),
  SIGN_IN_WINDOW_MIN: z.coerce.number().positive().default(15),
  // Sign-ups and invitation acceptances per client address per hour.
  SIGN_UP_PER_HOUR: z.coerce.number().int().positive().default(20),
  // How many reverse proxies in front of the app append to X-Forwarded-For.
  // 0 (the default): the app faces clients directly, and X-Forwarded-For and
  // X-Forwarded-Host are ignored (a client can write anything there). n > 0:
  // the client address is the n-th entry from the right of X-Forwarded-For
  // (the one the outermost trusted proxy saw), and X-Forwarded-Host is believed.
  TRUST_PROXY_HOPS: z.coerce.number().int().min(0).max(10).default(0),
  // Backups (lib/backup/): where `npm run backup` and the app's own timer put
  // dated copies, how many to keep, and how often the app takes one on its own
  // (hours; 0 = never, 24 = once a day).
  BACKUP_DIR: z.string().min(1).default('./data/backups'),
  BACKUP_KEEP: z.coerce.number().int().min(1).max(365).default(7),
  BACKUP_EVERY_HOURS: z.coerce.number().min(0).max(24 * 30).default(0),
  // The upload stand-in's folder of stored files, when it is the photo store
  // (the launcher sets it); backups copy it beside the database.
  UPLOADS_FAKE_DIR: z.string().min(1).optional(),
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
