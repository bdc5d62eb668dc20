import 'reflect-metadata';
import { createDataSource } from '../server/db/data-source';
import { seedDemo } from '../server/db/seed';

/**
 * Seeds the invented demo scenario into DATABASE_URL (migrated first). With `--if-empty` a
 * database that already holds operations is left as it is and the script still exits 0;
 * without it, a non-empty database is reported as an error.
 */
const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set.');
  process.exit(1);
}
const ifEmpty = process.argv.includes('--if-empty');

const db = createDataSource({ url, poolSize: 2, statementTimeoutMs: 60_000 });
await db.initialize();
try {
  const { seeded } = await seedDemo(db);
  if (seeded) {
    console.log('[seed] seeded the demo scenario (sign in as owner@demo.test / duskhaul-demo)');
  } else if (ifEmpty) {
    console.log('[seed] the database already has operations; nothing seeded');
  } else {
    console.error(
      '[seed] the database already has operations; nothing seeded (use --if-empty to allow this)',
    );
    process.exitCode = 1;
  }
} finally {
  await db.destroy();
}
