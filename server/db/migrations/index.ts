import { SeasonRecords1764640000000 } from './1764640000000-season-records';

/** Migrations in the order they run. */
export const migrations = [SeasonRecords1764640000000];
