import { archiveRoute } from '../_archive/archiveRoute';

// Brings an archived match back (approved when it has a standard, else open).
export const POST = archiveRoute(false);
