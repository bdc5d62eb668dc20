import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The season's records. Every tenant-owned table carries operation_id and leads its indexes with
 * it, so a large deployment can shard by operation. Editable records carry `version` (checked in
 * each UPDATE's WHERE clause) and `archived_at` (records are archived, never deleted).
 */
export class SeasonRecords1764640000000 implements MigrationInterface {
  name = 'SeasonRecords1764640000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE EXTENSION IF NOT EXISTS pgcrypto;

      CREATE TABLE operations (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name text NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      );

      CREATE TABLE growers (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        name text NOT NULL,
        billing_address text NOT NULL DEFAULT '',
        internal_notes text NOT NULL DEFAULT '',
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX growers_operation ON growers (operation_id, name);

      CREATE TABLE grower_contacts (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        grower_id uuid NOT NULL REFERENCES growers(id),
        name text NOT NULL,
        email text,
        phone text,
        title text NOT NULL DEFAULT '',
        position integer NOT NULL DEFAULT 0
      );
      CREATE INDEX grower_contacts_grower ON grower_contacts (operation_id, grower_id);

      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        email text NOT NULL,
        name text NOT NULL,
        role text NOT NULL CHECK (role IN ('owner', 'planner', 'crew', 'grower')),
        grower_id uuid REFERENCES growers(id),
        password_hash text NOT NULL,
        units text NOT NULL DEFAULT 'imperial' CHECK (units IN ('imperial', 'metric')),
        active boolean NOT NULL DEFAULT true,
        version integer NOT NULL DEFAULT 1,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK ((role = 'grower') = (grower_id IS NOT NULL))
      );
      CREATE UNIQUE INDEX users_email ON users (lower(email));
      CREATE INDEX users_operation ON users (operation_id, role);

      CREATE TABLE yards (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        name text NOT NULL,
        latitude double precision NOT NULL,
        longitude double precision NOT NULL,
        capacity integer NOT NULL CHECK (capacity >= 0),
        access_notes text NOT NULL DEFAULT '',
        notes text NOT NULL DEFAULT '',
        last_visit_on date,
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX yards_operation ON yards (operation_id, name);

      CREATE TABLE sites (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        grower_id uuid REFERENCES growers(id),
        name text NOT NULL,
        kind text NOT NULL CHECK (kind IN ('orchard', 'seed-field', 'honey')),
        crop text NOT NULL,
        boundary jsonb,
        latitude double precision NOT NULL,
        longitude double precision NOT NULL,
        area_ha double precision,
        bloom_start_on date,
        bloom_end_on date,
        access_notes text NOT NULL DEFAULT '',
        notes text NOT NULL DEFAULT '',
        drops jsonb,
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX sites_operation ON sites (operation_id, name);
      CREATE INDEX sites_grower ON sites (operation_id, grower_id);

      CREATE TABLE hive_setups (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        name text NOT NULL,
        boxes jsonb NOT NULL,
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX hive_setups_operation ON hive_setups (operation_id, name);

      CREATE TABLE contracts (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        grower_id uuid NOT NULL REFERENCES growers(id),
        site_ids uuid[] NOT NULL DEFAULT '{}',
        crop text NOT NULL,
        season integer NOT NULL,
        status text NOT NULL,
        colonies_ordered integer NOT NULL CHECK (colonies_ordered > 0),
        min_frames double precision NOT NULL,
        average_frames double precision,
        fee_per_colony_cents integer NOT NULL CHECK (fee_per_colony_cents >= 0),
        deposit_cents integer NOT NULL DEFAULT 0 CHECK (deposit_cents >= 0),
        frame_adjustment_cents integer NOT NULL DEFAULT 0,
        delivery_start_on date NOT NULL,
        delivery_end_on date NOT NULL,
        removal_on date,
        spray_notice_hours integer NOT NULL DEFAULT 48,
        terms text NOT NULL DEFAULT '',
        internal_notes text NOT NULL DEFAULT '',
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (delivery_end_on >= delivery_start_on)
      );
      CREATE INDEX contracts_operation ON contracts (operation_id, season, status);
      CREATE INDEX contracts_grower ON contracts (operation_id, grower_id);

      CREATE TABLE contract_events (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        contract_id uuid NOT NULL REFERENCES contracts(id),
        kind text NOT NULL,
        detail jsonb NOT NULL DEFAULT '{}',
        actor_user_id uuid REFERENCES users(id),
        occurred_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX contract_events_contract ON contract_events (operation_id, contract_id, occurred_at);

      CREATE TABLE colony_lots (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        name text NOT NULL,
        hive_setup_id uuid NOT NULL REFERENCES hive_setups(id),
        colonies_per_pallet integer NOT NULL CHECK (colonies_per_pallet > 0),
        queen_status text NOT NULL DEFAULT 'queen-right',
        mean_frames double precision,
        notes text NOT NULL DEFAULT '',
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX colony_lots_operation ON colony_lots (operation_id, name);

      CREATE TABLE trucks (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        name text NOT NULL,
        payload_kg double precision NOT NULL CHECK (payload_kg > 0),
        pallet_spots integer NOT NULL CHECK (pallet_spots > 0),
        tiers integer NOT NULL CHECK (tiers > 0),
        tare_kg double precision NOT NULL CHECK (tare_kg >= 0),
        legal_gross_kg double precision NOT NULL,
        notes text NOT NULL DEFAULT '',
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX trucks_operation ON trucks (operation_id, name);

      CREATE TABLE moves (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        name text NOT NULL,
        night_of date NOT NULL,
        status text NOT NULL,
        destination_kind text NOT NULL CHECK (destination_kind IN ('yard', 'site')),
        destination_ids uuid[] NOT NULL,
        contract_id uuid REFERENCES contracts(id),
        drivers integer NOT NULL DEFAULT 1 CHECK (drivers IN (1, 2)),
        loading_minutes integer NOT NULL DEFAULT 90,
        average_speed_kmh double precision NOT NULL DEFAULT 80,
        timeline jsonb,
        notes text NOT NULL DEFAULT '',
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX moves_operation ON moves (operation_id, night_of);

      -- Which colonies a move takes from which yard: the promise that planning checks.
      CREATE TABLE move_origins (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        move_id uuid NOT NULL REFERENCES moves(id),
        yard_id uuid NOT NULL REFERENCES yards(id),
        lot_id uuid NOT NULL REFERENCES colony_lots(id),
        colonies integer NOT NULL CHECK (colonies > 0),
        pickup_order integer NOT NULL DEFAULT 0
      );
      CREATE INDEX move_origins_move ON move_origins (operation_id, move_id);
      CREATE INDEX move_origins_yard ON move_origins (operation_id, yard_id, lot_id);

      CREATE TABLE move_loads (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        move_id uuid NOT NULL REFERENCES moves(id),
        truck_id uuid NOT NULL REFERENCES trucks(id),
        driver_names text[] NOT NULL DEFAULT '{}',
        pallets_planned integer NOT NULL DEFAULT 0,
        colonies_planned integer NOT NULL DEFAULT 0,
        pallets_loaded integer,
        colonies_placed integer,
        colonies_lost integer,
        pre_roll_check jsonb,
        notes text NOT NULL DEFAULT '',
        version integer NOT NULL DEFAULT 1
      );
      CREATE INDEX move_loads_move ON move_loads (operation_id, move_id);

      -- The colony ledger: counts change only through dated entries; nothing is overwritten.
      CREATE TABLE ledger_entries (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        lot_id uuid NOT NULL REFERENCES colony_lots(id),
        kind text NOT NULL CHECK (kind IN ('move', 'loss', 'split', 'purchase', 'correction')),
        occurred_on date NOT NULL,
        colonies integer NOT NULL CHECK (colonies > 0),
        from_kind text CHECK (from_kind IN ('yard', 'site')),
        from_id uuid,
        to_kind text CHECK (to_kind IN ('yard', 'site')),
        to_id uuid,
        reason text NOT NULL DEFAULT '',
        move_id uuid REFERENCES moves(id),
        recorded_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now(),
        CHECK ((from_kind IS NULL) = (from_id IS NULL)),
        CHECK ((to_kind IS NULL) = (to_id IS NULL)),
        CHECK (
          (kind = 'move' AND from_id IS NOT NULL AND to_id IS NOT NULL) OR
          (kind = 'loss' AND from_id IS NOT NULL AND to_id IS NULL) OR
          (kind IN ('split', 'purchase') AND from_id IS NULL AND to_id IS NOT NULL) OR
          (kind = 'correction' AND (from_id IS NULL) <> (to_id IS NULL))
        )
      );
      CREATE INDEX ledger_from ON ledger_entries (operation_id, from_kind, from_id, occurred_on);
      CREATE INDEX ledger_to ON ledger_entries (operation_id, to_kind, to_id, occurred_on);
      CREATE INDEX ledger_lot ON ledger_entries (operation_id, lot_id, occurred_on);

      CREATE TABLE weight_samples (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        yard_id uuid REFERENCES yards(id),
        lot_id uuid REFERENCES colony_lots(id),
        move_id uuid REFERENCES moves(id),
        sampled_on date NOT NULL,
        weights_kg double precision[] NOT NULL,
        notes text NOT NULL DEFAULT '',
        recorded_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX weight_samples_yard ON weight_samples (operation_id, yard_id, sampled_on);

      CREATE TABLE strength_samples (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        place_kind text NOT NULL CHECK (place_kind IN ('yard', 'site')),
        place_id uuid NOT NULL,
        lot_id uuid REFERENCES colony_lots(id),
        sampled_on date NOT NULL,
        frames double precision[] NOT NULL,
        notes text NOT NULL DEFAULT '',
        recorded_by uuid REFERENCES users(id),
        created_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX strength_samples_place ON strength_samples (operation_id, place_kind, place_id, sampled_on);

      CREATE TABLE spray_notices (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        grower_id uuid NOT NULL REFERENCES growers(id),
        site_id uuid NOT NULL REFERENCES sites(id),
        starts_at timestamptz NOT NULL,
        ends_at timestamptz NOT NULL,
        product text NOT NULL,
        notes text NOT NULL DEFAULT '',
        status text NOT NULL DEFAULT 'filed',
        action text,
        acknowledged_by uuid REFERENCES users(id),
        acknowledged_at timestamptz,
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (ends_at > starts_at)
      );
      CREATE INDEX spray_notices_operation ON spray_notices (operation_id, starts_at);

      CREATE TABLE invoices (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        contract_id uuid NOT NULL REFERENCES contracts(id),
        grower_id uuid NOT NULL REFERENCES growers(id),
        number integer NOT NULL,
        kind text NOT NULL CHECK (kind IN ('deposit', 'balance', 'adjustment')),
        status text NOT NULL,
        lines jsonb NOT NULL DEFAULT '[]',
        amount_cents integer NOT NULL,
        issued_on date,
        due_on date,
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (operation_id, number)
      );

      CREATE TABLE payments (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        invoice_id uuid NOT NULL REFERENCES invoices(id),
        amount_cents integer NOT NULL,
        provider_reference text NOT NULL,
        received_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (provider_reference)
      );
      CREATE INDEX payments_invoice ON payments (operation_id, invoice_id);

      CREATE TABLE documents (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        kind text NOT NULL,
        original_name text NOT NULL,
        stored_name text NOT NULL UNIQUE,
        content_type text NOT NULL,
        size_bytes integer NOT NULL,
        attached_kind text CHECK (attached_kind IN ('contract', 'site', 'yard', 'move')),
        attached_id uuid,
        shared_with_grower boolean NOT NULL DEFAULT false,
        uploaded_by uuid REFERENCES users(id),
        version integer NOT NULL DEFAULT 1,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      );
      CREATE INDEX documents_attached ON documents (operation_id, attached_kind, attached_id);

      CREATE TABLE sent_emails (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        operation_id uuid NOT NULL REFERENCES operations(id),
        recipient text NOT NULL,
        subject text NOT NULL,
        purpose text NOT NULL,
        related_kind text,
        related_id uuid,
        status text NOT NULL DEFAULT 'queued',
        provider_message_id text,
        created_at timestamptz NOT NULL DEFAULT now(),
        sent_at timestamptz
      );
      CREATE INDEX sent_emails_operation ON sent_emails (operation_id, created_at);

      -- A retried request with the same key answers with the first result instead of acting twice.
      CREATE TABLE idempotency_keys (
        operation_id uuid NOT NULL REFERENCES operations(id),
        key text NOT NULL,
        request_hash text NOT NULL,
        status_code integer NOT NULL,
        response jsonb NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (operation_id, key)
      );

      -- Sessions (connect-pg-simple's table, plus the user for "end this user's sessions").
      CREATE TABLE sessions (
        sid varchar NOT NULL PRIMARY KEY,
        sess json NOT NULL,
        expire timestamp(6) NOT NULL
      );
      CREATE INDEX sessions_expire ON sessions (expire);
      CREATE INDEX sessions_user ON sessions (((sess -> 'passport' ->> 'user')));

      -- Failed sign-ins per e-mail and address, shared by every app server.
      CREATE TABLE sign_in_failures (
        key text PRIMARY KEY,
        failures integer NOT NULL,
        last_failure_at timestamptz NOT NULL
      );
    `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      DROP TABLE IF EXISTS sign_in_failures, sessions, idempotency_keys, sent_emails, documents,
        payments, invoices, spray_notices, strength_samples, weight_samples, ledger_entries,
        move_loads, move_origins, moves, trucks, colony_lots, contract_events, contracts,
        hive_setups, sites, yards, users, grower_contacts, growers, operations CASCADE;
    `);
  }
}
