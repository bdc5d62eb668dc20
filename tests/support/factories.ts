import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { hashPassword } from '../../server/modules/session/passwords';
import type { Role } from '../../shared/schemas/users';

export const testPassword = 'correct-horse-battery';
let hash: Promise<string> | undefined;
const passwordHash = () => (hash ??= hashPassword(testPassword));

export interface TestUser {
  id: string;
  email: string;
  role: Role;
  growerId: string | null;
}

/** A fresh operation (tenant) with its own records, so test files never see each other's data. */
export async function createOperation(db: DataSource, name = 'Test operation') {
  const [row] = await db.query(`INSERT INTO operations (name) VALUES ($1) RETURNING id`, [name]);
  return row.id as string;
}

export async function createGrower(db: DataSource, operationId: string, name = 'Test grower') {
  const [row] = await db.query(
    `INSERT INTO growers (operation_id, name, internal_notes) VALUES ($1, $2, 'internal: pays late') RETURNING id`,
    [operationId, name],
  );
  return row.id as string;
}

export async function createUser(
  db: DataSource,
  operationId: string,
  role: Role,
  growerId: string | null = null,
): Promise<TestUser> {
  const email = `${role}-${randomUUID().slice(0, 8)}@example.test`;
  const [row] = await db.query(
    `INSERT INTO users (operation_id, email, name, role, grower_id, password_hash) VALUES ($1, $2, $3, $4, $5, $6) RETURNING id`,
    [operationId, email, `Test ${role}`, role, growerId, await passwordHash()],
  );
  return { id: row.id, email, role, growerId };
}

/** An operation with one user of each role, two growers (A with a user, B with a user). */
export async function createCrew(db: DataSource) {
  const operationId = await createOperation(db);
  const growerA = await createGrower(db, operationId, 'Grower A');
  const growerB = await createGrower(db, operationId, 'Grower B');
  return {
    operationId,
    growerA,
    growerB,
    owner: await createUser(db, operationId, 'owner'),
    planner: await createUser(db, operationId, 'planner'),
    crew: await createUser(db, operationId, 'crew'),
    growerUserA: await createUser(db, operationId, 'grower', growerA),
    growerUserB: await createUser(db, operationId, 'grower', growerB),
  };
}

export async function createHiveSetup(db: DataSource, operationId: string) {
  const [row] = await db.query(
    `INSERT INTO hive_setups (operation_id, name, boxes) VALUES ($1, 'Two deeps', $2) RETURNING id`,
    [
      operationId,
      JSON.stringify([
        { size: 'deep', honeyFill: 0.5 },
        { size: 'deep', honeyFill: 0.2 },
      ]),
    ],
  );
  return row.id as string;
}

export async function createLot(db: DataSource, operationId: string, hiveSetupId?: string) {
  const setup = hiveSetupId ?? (await createHiveSetup(db, operationId));
  const [row] = await db.query(
    `INSERT INTO colony_lots (operation_id, name, hive_setup_id, colonies_per_pallet, mean_frames) VALUES ($1, 'Lot', $2, 4, 8) RETURNING id`,
    [operationId, setup],
  );
  return row.id as string;
}

export async function createYard(db: DataSource, operationId: string, name = 'Test yard') {
  const [row] = await db.query(
    `INSERT INTO yards (operation_id, name, latitude, longitude, capacity, access_notes) VALUES ($1, $2, 28.1, -97.9, 500, 'gate code 1234') RETURNING id`,
    [operationId, name],
  );
  return row.id as string;
}

/** Puts colonies of a lot into a yard through a purchase entry (the ledger is the only way). */
export async function buyColonies(
  db: DataSource,
  operationId: string,
  lotId: string,
  yardId: string,
  colonies: number,
  on = '2026-01-01',
) {
  await db.query(
    `INSERT INTO ledger_entries (operation_id, lot_id, kind, occurred_on, colonies, to_kind, to_id, reason)
     VALUES ($1, $2, 'purchase', $3, $4, 'yard', $5, 'test stock')`,
    [operationId, lotId, on, colonies, yardId],
  );
}
