import { requireMember } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';

export const GET = withApi(async () => json(await requireMember()));
