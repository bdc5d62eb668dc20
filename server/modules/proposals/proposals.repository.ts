import type { EntityManager } from 'typeorm';
import type { ProposalPurpose, ProposalStatus } from '../../../shared/schemas/proposals';
import type { ProposalFacts } from './proposal-emails';
import { returningRows } from '../jobs/returning-rows';

/** A proposal as stored (dates as YYYY-MM-DD text). */
export interface ProposalRow {
  id: string;
  operation_id: string;
  contract_id: string;
  delivery_start_on: string;
  delivery_end_on: string;
  colonies: number;
  note: string;
  status: ProposalStatus;
  expires_at: Date;
  responded_at: Date | null;
  responded_via: 'link' | 'portal' | null;
  counter_start_on: string | null;
  counter_end_on: string | null;
  counter_colonies: number | null;
  response_note: string;
  version: number;
  created_at: Date;
}

/** The columns of a ProposalRow, dates cast to text so no time zone ever shifts a day. */
export const proposalColumns = `id, operation_id, contract_id, delivery_start_on::text AS delivery_start_on,
  delivery_end_on::text AS delivery_end_on, colonies, note, status, expires_at, responded_at,
  responded_via, counter_start_on::text AS counter_start_on, counter_end_on::text AS counter_end_on,
  counter_colonies, response_note, version, created_at`;

/** A proposal as the API presents it. */
export function presentProposal(p: ProposalRow) {
  return {
    id: p.id,
    contractId: p.contract_id,
    deliveryStartOn: p.delivery_start_on,
    deliveryEndOn: p.delivery_end_on,
    colonies: p.colonies,
    note: p.note,
    status: p.status,
    expiresAt: p.expires_at.toISOString(),
    respondedAt: p.responded_at ? p.responded_at.toISOString() : null,
    respondedVia: p.responded_via,
    counter:
      p.counter_start_on && p.counter_end_on
        ? {
            deliveryStartOn: p.counter_start_on,
            deliveryEndOn: p.counter_end_on,
            colonies: p.counter_colonies,
          }
        : null,
    responseNote: p.response_note,
    version: p.version,
    createdAt: p.created_at.toISOString(),
  };
}

/** The proposal of this operation with this id, or null. */
export async function findProposal(
  tx: EntityManager,
  operationId: string,
  id: string,
): Promise<ProposalRow | null> {
  const rows: ProposalRow[] = await tx.query(
    `SELECT ${proposalColumns} FROM proposals WHERE operation_id = $1 AND id = $2`,
    [operationId, id],
  );
  return rows[0] ?? null;
}

/** The link token with this digest (any operation: digests are unique), or null. */
export async function findToken(tx: EntityManager, digest: string) {
  const rows: Array<{
    id: string;
    operation_id: string;
    proposal_id: string;
    contract_id: string;
    purpose: ProposalPurpose;
    used: boolean;
    expired: boolean;
  }> = await tx.query(
    `SELECT id, operation_id, proposal_id, contract_id, purpose,
            used_at IS NOT NULL AS used, expires_at <= now() AS expired
       FROM proposal_tokens WHERE token_sha256 = $1`,
    [digest],
  );
  return rows[0] ?? null;
}

/**
 * Uses the token: true for exactly one caller however many race, and never for a used or
 * expired token (the row lock makes concurrent updates re-check the WHERE clause).
 */
export async function consumeToken(tx: EntityManager, digest: string): Promise<boolean> {
  const rows = returningRows(
    await tx.query(
      `UPDATE proposal_tokens SET used_at = now()
        WHERE token_sha256 = $1 AND used_at IS NULL AND expires_at > now()
        RETURNING id`,
      [digest],
    ),
  );
  return rows.length === 1;
}

/** Marks every link of the proposals used (after an answer, or when a newer proposal replaces them). */
export async function retireTokens(tx: EntityManager, operationId: string, proposalIds: string[]) {
  if (proposalIds.length === 0) return;
  await tx.query(
    `UPDATE proposal_tokens SET used_at = COALESCE(used_at, now())
      WHERE operation_id = $1 AND proposal_id = ANY($2::uuid[])`,
    [operationId, proposalIds],
  );
}

/** What the e-mails and the response page say about a proposal's contract. */
export async function proposalFacts(
  tx: EntityManager,
  p: ProposalRow,
): Promise<ProposalFacts & { growerId: string; contractStatus: string }> {
  const [row] = await tx.query(
    `SELECT c.crop, c.season, c.grower_id, c.status, g.name AS grower_name, o.name AS operation_name,
            COALESCE((SELECT array_agg(s.name ORDER BY s.name) FROM sites s
                       WHERE s.operation_id = c.operation_id AND s.id = ANY(c.site_ids)), '{}') AS site_names,
            (SELECT count(*)::int FROM proposals p2
              WHERE p2.operation_id = c.operation_id AND p2.contract_id = c.id) AS sequence
       FROM contracts c
       JOIN growers g ON g.id = c.grower_id
       JOIN operations o ON o.id = c.operation_id
      WHERE c.operation_id = $1 AND c.id = $2`,
    [p.operation_id, p.contract_id],
  );
  return {
    contractId: p.contract_id,
    proposalId: p.id,
    operationName: row.operation_name,
    growerName: row.grower_name,
    growerId: row.grower_id,
    contractStatus: row.status,
    crop: row.crop,
    season: row.season,
    siteNames: row.site_names,
    deliveryStartOn: p.delivery_start_on,
    deliveryEndOn: p.delivery_end_on,
    colonies: p.colonies,
    note: p.note,
    sequence: row.sequence,
  };
}

/** One step in the contract's history. */
export async function recordContractEvent(
  tx: EntityManager,
  operationId: string,
  contractId: string,
  kind: string,
  detail: Record<string, unknown>,
  actorUserId: string | null,
) {
  await tx.query(
    `INSERT INTO contract_events (operation_id, contract_id, kind, detail, actor_user_id)
     VALUES ($1, $2, $3, $4, $5)`,
    [operationId, contractId, kind, JSON.stringify(detail), actorUserId],
  );
}
