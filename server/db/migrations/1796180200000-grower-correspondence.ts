import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What growers and planners exchange: date proposals with their single-use e-mail link tokens,
 * in-app notifications, and the extra bookkeeping e-mails, spray notices and documents need.
 * Tokens are kept only as SHA-256 digests; the links themselves exist only in the e-mails.
 */
export class GrowerCorrespondence1796180200000 implements MigrationInterface {
  name = 'GrowerCorrespondence1796180200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE proposals (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        contract_id uuid NOT NULL REFERENCES contracts(id),
        delivery_start_on date NOT NULL,
        delivery_end_on date NOT NULL,
        colonies integer NOT NULL CHECK (colonies > 0),
        note text NOT NULL DEFAULT '',
        status text NOT NULL DEFAULT 'open'
          CHECK (status IN ('open', 'confirmed', 'declined', 'countered', 'superseded')),
        proposed_by uuid REFERENCES users(id),
        expires_at timestamptz NOT NULL,
        responded_at timestamptz,
        responded_via text CHECK (responded_via IN ('link', 'portal')),
        responded_by uuid REFERENCES users(id),
        counter_start_on date,
        counter_end_on date,
        counter_colonies integer CHECK (counter_colonies > 0),
        response_note text NOT NULL DEFAULT '',
        version integer NOT NULL DEFAULT 1,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (delivery_end_on >= delivery_start_on),
        CHECK (counter_end_on IS NULL OR counter_end_on >= counter_start_on)
      );
      CREATE INDEX proposals_contract ON proposals (operation_id, contract_id, created_at);
      CREATE INDEX proposals_status ON proposals (operation_id, status);

      -- One row per e-mailed link: purpose-bound, expiring, single use; the token only hashed.
      CREATE TABLE proposal_tokens (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        proposal_id uuid NOT NULL REFERENCES proposals(id),
        contract_id uuid NOT NULL REFERENCES contracts(id),
        purpose text NOT NULL CHECK (purpose IN ('confirm', 'decline', 'counter')),
        token_sha256 text NOT NULL UNIQUE CHECK (token_sha256 ~ '^[0-9a-f]{64}$'),
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX proposal_tokens_proposal ON proposal_tokens (operation_id, proposal_id);

      -- In-app notices for a staff user (a grower answered, a spray notice was filed …).
      CREATE TABLE notifications (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        user_id uuid NOT NULL REFERENCES users(id),
        kind text NOT NULL,
        title text NOT NULL,
        body text NOT NULL DEFAULT '',
        related_kind text,
        related_id uuid,
        created_at timestamptz NOT NULL DEFAULT now(),
        read_at timestamptz
      );
      CREATE INDEX notifications_user ON notifications (operation_id, user_id, created_at DESC);

      ALTER TABLE sent_emails
        ADD COLUMN attempts integer NOT NULL DEFAULT 0,
        ADD COLUMN last_error text,
        ADD COLUMN failed_at timestamptz,
        ADD CONSTRAINT sent_emails_status CHECK (status IN ('queued', 'sent', 'failed'));
      CREATE INDEX sent_emails_related ON sent_emails (operation_id, related_kind, related_id);

      ALTER TABLE spray_notices
        ADD COLUMN action_note text NOT NULL DEFAULT '',
        ADD COLUMN filed_by uuid REFERENCES users(id),
        ADD CONSTRAINT spray_notices_status CHECK (status IN ('filed', 'acknowledged')),
        ADD CONSTRAINT spray_notices_action CHECK (action IN ('move', 'cover', 'no-action'));
      CREATE INDEX spray_notices_grower ON spray_notices (operation_id, grower_id, starts_at);

      ALTER TABLE documents
        ADD COLUMN sha256 text,
        ADD COLUMN updated_at timestamptz NOT NULL DEFAULT now(),
        ADD CONSTRAINT documents_kind
          CHECK (kind IN ('contract', 'inspection-certificate', 'photo', 'boundary', 'other'));
    `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      ALTER TABLE documents DROP CONSTRAINT documents_kind, DROP COLUMN updated_at, DROP COLUMN sha256;
      DROP INDEX spray_notices_grower;
      ALTER TABLE spray_notices DROP CONSTRAINT spray_notices_action,
        DROP CONSTRAINT spray_notices_status, DROP COLUMN filed_by, DROP COLUMN action_note;
      DROP INDEX sent_emails_related;
      ALTER TABLE sent_emails DROP CONSTRAINT sent_emails_status, DROP COLUMN failed_at,
        DROP COLUMN last_error, DROP COLUMN attempts;
      DROP TABLE IF EXISTS notifications, proposal_tokens, proposals;
    `);
  }
}
