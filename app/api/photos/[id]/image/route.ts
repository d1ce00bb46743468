import { db } from '@/db';
import { getPhotoFile } from '@/db/queries/photos';
import { requireMember } from '@/lib/auth/current';
import { notFoundError, withApi } from '@/lib/http/api';
import { fetchStored } from '@/lib/uploads/service';

export const dynamic = 'force-dynamic';

// The photo's bytes, fetched from the upload service server-side and streamed
// to members of the photo's team only; the service's URL never reaches the browser.
export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const file = getPhotoFile(db(), member.team.id, id);
  if (!file) throw notFoundError('No such photo');
  const stored = await fetchStored(file.fileKey);
  const ascii = file.fileName.replace(/[^\x20-\x7e]|["\\]/g, '_');
  return new Response(stored.body, {
    status: 200,
    headers: {
      'content-type': file.mime,
      'content-length': stored.headers.get('content-length') ?? String(file.size),
      'content-disposition': `inline; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
      // A photo never changes under its id; only this member's browser may keep it.
      'cache-control': 'private, max-age=3600',
      'x-content-type-options': 'nosniff',
      'content-security-policy': "default-src 'none'; sandbox",
    },
  });
});
