import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The crew record colonies left behind per pick-up stop (yard and lot) of a truck, so placing a
 * move keeps them in the yard they were left in instead of sharing them out over every origin.
 */
export class LeftBehindByStop1796230000000 implements MigrationInterface {
  name = 'LeftBehindByStop1796230000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE move_loads ADD COLUMN left_behind_by_stop jsonb`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE move_loads DROP COLUMN left_behind_by_stop`);
  }
}
