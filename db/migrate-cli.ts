import { openDatabase } from './open';

const file = process.env.DATABASE_URL ?? './data/pourproof.db';
openDatabase(file, { migrate: true }).$client.close();
console.log(`migrated ${file}`);
