import { db } from '@/db';
import { exportTeam } from '@/db/queries/teamExport';
import { appUrl } from '@/lib/appUrl';
import { requireRole } from '@/lib/auth/current';
import { withApi } from '@/lib/http/api';

export const dynamic = 'force-dynamic';

// Everything the shop owns as one JSON file, for its owner: no shop is locked in.
export const GET = withApi(async (req) => {
  const owner = await requireRole('owner');
  const body = exportTeam(db(), owner.team.id, appUrl(req));
  const day = new Date().toISOString().slice(0, 10);
  return new Response(JSON.stringify(body, null, 1), {
    status: 200,
    headers: {
      'content-type': 'application/json; charset=utf-8',
      'content-disposition': `attachment; filename="pourproof-export-${day}.json"`,
      'cache-control': 'no-store',
    },
  });
});
