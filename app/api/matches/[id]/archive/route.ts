import { archiveRoute } from '../_archive/archiveRoute';

// Retires the match and its standard; everything stays readable.
export const POST = archiveRoute(true);
