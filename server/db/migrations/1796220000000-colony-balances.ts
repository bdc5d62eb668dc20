import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Colony counts without summing the whole ledger on every read.
 *
 * - `ledger_flows`: each ledger entry as signed flows (+ where colonies arrive, − where they
 *   leave), the one definition every count sums. PostgreSQL pushes a query's filters into both
 *   branches, so a count for one place reads only that place's entries.
 * - `colony_balances`: the sum of every flow per place and lot, kept by a trigger in the same
 *   transaction as the entry. The ledger stays the only record; this is its running total.
 *   A count on a date is the balance less the flows dated after it (few: entries record what
 *   happened), read through `ledger_by_date`.
 */
export class ColonyBalances1796220000000 implements MigrationInterface {
  name = 'ColonyBalances1796220000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE VIEW ledger_flows AS
        SELECT operation_id, lot_id, to_kind AS place_kind, to_id AS place_id,
               colonies AS delta, occurred_on
          FROM ledger_entries WHERE to_id IS NOT NULL
        UNION ALL
        SELECT operation_id, lot_id, from_kind, from_id, -colonies, occurred_on
          FROM ledger_entries WHERE from_id IS NOT NULL;

      CREATE INDEX ledger_by_date ON ledger_entries (operation_id, occurred_on);

      CREATE TABLE colony_balances (
        operation_id uuid NOT NULL REFERENCES operations(id),
        place_kind text NOT NULL,
        place_id uuid NOT NULL,
        lot_id uuid NOT NULL,
        colonies integer NOT NULL,
        PRIMARY KEY (operation_id, place_kind, place_id, lot_id)
      );

      CREATE FUNCTION colony_balances_add(entry ledger_entries, sign integer) RETURNS void
      LANGUAGE plpgsql AS $$
      BEGIN
        IF entry.to_id IS NOT NULL THEN
          INSERT INTO colony_balances AS b VALUES
            (entry.operation_id, entry.to_kind, entry.to_id, entry.lot_id, sign * entry.colonies)
          ON CONFLICT (operation_id, place_kind, place_id, lot_id)
          DO UPDATE SET colonies = b.colonies + EXCLUDED.colonies;
        END IF;
        IF entry.from_id IS NOT NULL THEN
          INSERT INTO colony_balances AS b VALUES
            (entry.operation_id, entry.from_kind, entry.from_id, entry.lot_id, -sign * entry.colonies)
          ON CONFLICT (operation_id, place_kind, place_id, lot_id)
          DO UPDATE SET colonies = b.colonies + EXCLUDED.colonies;
        END IF;
      END $$;

      CREATE FUNCTION colony_balances_follow() RETURNS trigger
      LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_OP IN ('UPDATE', 'DELETE') THEN PERFORM colony_balances_add(OLD, -1); END IF;
        IF TG_OP IN ('INSERT', 'UPDATE') THEN PERFORM colony_balances_add(NEW, 1); END IF;
        RETURN NULL;
      END $$;

      CREATE FUNCTION colony_balances_clear() RETURNS trigger
      LANGUAGE plpgsql AS $$
      BEGIN
        DELETE FROM colony_balances;
        RETURN NULL;
      END $$;

      CREATE TRIGGER colony_balances_follow AFTER INSERT OR UPDATE OR DELETE ON ledger_entries
        FOR EACH ROW EXECUTE FUNCTION colony_balances_follow();
      CREATE TRIGGER colony_balances_clear AFTER TRUNCATE ON ledger_entries
        FOR EACH STATEMENT EXECUTE FUNCTION colony_balances_clear();

      INSERT INTO colony_balances
        SELECT operation_id, place_kind, place_id, lot_id, SUM(delta)
          FROM ledger_flows GROUP BY operation_id, place_kind, place_id, lot_id;
    `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      DROP TRIGGER colony_balances_clear ON ledger_entries;
      DROP TRIGGER colony_balances_follow ON ledger_entries;
      DROP FUNCTION colony_balances_clear();
      DROP FUNCTION colony_balances_follow();
      DROP FUNCTION colony_balances_add(ledger_entries, integer);
      DROP TABLE colony_balances;
      DROP INDEX ledger_by_date;
      DROP VIEW ledger_flows;
    `);
  }
}
