import 'reflect-metadata';
import { createDataSource } from '../server/db/data-source';

/** Runs pending migrations against DATABASE_URL. */
const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set.');
  process.exit(1);
}
const db = createDataSource({ url });
await db.initialize();
const ran = await db.runMigrations({ transaction: 'each' });
console.error(`[migrate] ${ran.length ? ran.map((m) => m.name).join(', ') : 'up to date'}`);
await db.destroy();
