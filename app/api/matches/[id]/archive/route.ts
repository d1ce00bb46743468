import { archiveRoute } from '@/lib/matches/archiveRoute';

// Retires the match and its standard; everything stays readable.
export const POST = archiveRoute(true);
