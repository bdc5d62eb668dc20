import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What billing and online payment need beyond the season records: invoice states and their
 * dates, the figures an invoice was computed from, one live deposit and one live balance per
 * contract, hosted checkout sessions, and the provider's webhook events (each applied once).
 */
export class InvoicePayments1796200000000 implements MigrationInterface {
  name = 'InvoicePayments1796200000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      ALTER TABLE invoices
        ADD COLUMN internal_notes text NOT NULL DEFAULT '',
        ADD COLUMN basis jsonb NOT NULL DEFAULT '{}',
        ADD COLUMN paid_at timestamptz,
        ADD COLUMN voided_at timestamptz,
        ADD CONSTRAINT invoices_status_known CHECK (status IN ('draft', 'sent', 'paid', 'void'));
      -- Two people billing the same contract at once cannot both create a deposit (or balance).
      CREATE UNIQUE INDEX invoices_one_live_per_kind ON invoices (contract_id, kind)
        WHERE status <> 'void' AND kind IN ('deposit', 'balance');
      CREATE INDEX invoices_listing ON invoices (operation_id, status, grower_id);
      CREATE INDEX invoices_contract ON invoices (operation_id, contract_id);

      ALTER TABLE payments
        ADD COLUMN provider_session_id text,
        ADD CONSTRAINT payments_amount_positive CHECK (amount_cents > 0);

      CREATE TABLE checkout_sessions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        invoice_id uuid NOT NULL REFERENCES invoices(id),
        provider_session_id text NOT NULL UNIQUE,
        url text NOT NULL,
        amount_cents integer NOT NULL CHECK (amount_cents > 0),
        currency text NOT NULL,
        status text NOT NULL CHECK (status IN ('open', 'complete', 'expired')),
        expires_at timestamptz,
        created_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        closed_at timestamptz
      );
      CREATE INDEX checkout_sessions_invoice ON checkout_sessions (operation_id, invoice_id, status);

      -- Every verified webhook event once: a redelivery finds its id here and changes nothing.
      CREATE TABLE payment_events (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        provider_event_id text NOT NULL UNIQUE,
        type text NOT NULL,
        operation_id uuid REFERENCES operations(id),
        invoice_id uuid REFERENCES invoices(id),
        provider_session_id text,
        provider_created_at timestamptz NOT NULL,
        received_at timestamptz NOT NULL DEFAULT now(),
        outcome text NOT NULL
      );
      CREATE INDEX payment_events_invoice ON payment_events (operation_id, invoice_id);
    `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      DROP TABLE payment_events;
      DROP TABLE checkout_sessions;
      ALTER TABLE payments DROP CONSTRAINT payments_amount_positive, DROP COLUMN provider_session_id;
      DROP INDEX invoices_contract;
      DROP INDEX invoices_listing;
      DROP INDEX invoices_one_live_per_kind;
      ALTER TABLE invoices
        DROP CONSTRAINT invoices_status_known,
        DROP COLUMN voided_at,
        DROP COLUMN paid_at,
        DROP COLUMN basis,
        DROP COLUMN internal_notes;
    `);
  }
}
