import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The crew counts pallets per pick-up stop (yard and lot) of a truck, not only per truck, so the
 * office can see which yard a short load came from.
 */
export class PalletsByStop1796210000000 implements MigrationInterface {
  name = 'PalletsByStop1796210000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE move_loads ADD COLUMN pallets_by_stop jsonb`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE move_loads DROP COLUMN pallets_by_stop`);
  }
}
