import { db } from '@/db';
import { requireMember } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';
import { colorantCharacterisation } from '@/lib/matches/characterisation';

// Which colorants the shop's colour model knows, from how many logged colours, and how well.
export const GET = withApi(async () => {
  const member = await requireMember();
  return json(await colorantCharacterisation(db(), member.team.id));
});
