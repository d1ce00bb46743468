import { sql } from 'drizzle-orm';
import { db } from '@/db';
import { errorResponse, json } from '@/lib/http/api';

export const dynamic = 'force-dynamic';

export async function GET() {
  try {
    db().get(sql`select 1`);
    return json({ ok: true });
  } catch (err) {
    console.error('[health] database not answering', err);
    return errorResponse(503, 'unavailable', 'The database is not answering');
  }
}
