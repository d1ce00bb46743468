import 'server-only';
import { getDb } from './client';

export const db = getDb;
export type { DB } from './open';
