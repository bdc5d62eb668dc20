import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What a night's move keeps beyond its inputs: each load's computed plan (pick-ups, weights) and
 * fill order, and the crew's records (left behind, colonies per drop). Plus one secret calendar
 * feed per user, its 256-bit token kept only as a SHA-256 digest.
 */
export class MovePlansAndFeeds1796190000000 implements MigrationInterface {
  name = 'MovePlansAndFeeds1796190000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      ALTER TABLE move_loads
        ADD COLUMN position integer NOT NULL DEFAULT 0,
        ADD COLUMN plan jsonb,
        ADD COLUMN colonies_left_behind integer,
        ADD COLUMN placements jsonb,
        ADD CONSTRAINT move_loads_counts_not_negative CHECK (
          pallets_planned >= 0 AND colonies_planned >= 0
          AND COALESCE(pallets_loaded, 0) >= 0 AND COALESCE(colonies_placed, 0) >= 0
          AND COALESCE(colonies_lost, 0) >= 0 AND COALESCE(colonies_left_behind, 0) >= 0
        );

      CREATE INDEX weight_samples_lot ON weight_samples (operation_id, lot_id, sampled_on);
      CREATE INDEX moves_contract ON moves (operation_id, contract_id);

      CREATE TABLE calendar_feeds (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        user_id uuid NOT NULL REFERENCES users(id),
        token_sha256 text NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        last_used_at timestamptz
      );
      CREATE UNIQUE INDEX calendar_feeds_user ON calendar_feeds (operation_id, user_id);
      CREATE UNIQUE INDEX calendar_feeds_token ON calendar_feeds (token_sha256);
    `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      DROP TABLE IF EXISTS calendar_feeds;
      DROP INDEX IF EXISTS moves_contract;
      DROP INDEX IF EXISTS weight_samples_lot;
      ALTER TABLE move_loads
        DROP CONSTRAINT IF EXISTS move_loads_counts_not_negative,
        DROP COLUMN IF EXISTS placements,
        DROP COLUMN IF EXISTS colonies_left_behind,
        DROP COLUMN IF EXISTS plan,
        DROP COLUMN IF EXISTS position;
    `);
  }
}
