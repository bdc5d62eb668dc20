import type { DataSource, EntityManager } from 'typeorm';
import type { Env } from '../../config/env';
import { AppError } from '../../errors/app-error';
import type { Actor } from '../../middleware/authorise';
import type { ContractStatus } from '../../../shared/schemas/contracts';
import type {
  ProposalCreateRequest,
  ProposalPurpose,
  ProposalStatus,
} from '../../../shared/schemas/proposals';
import { contracts, presentContract } from '../contracts/contracts.service';
import { growerContactAddresses, plannerRecipients, queueEmail } from '../emails/email-outbox';
import type { JobQueue } from '../jobs/job-queue';
import { notifyPlanners } from '../notifications/notifications';
import {
  agreedEmail,
  answerEmail,
  humanWindow,
  proposalEmail,
  type GrowerAnswer,
  type ProposalFacts,
} from './proposal-emails';
import { newLinkToken, tokenDigest } from './proposal-tokens';
import { returningRows } from '../jobs/returning-rows';
import {
  consumeToken,
  findProposal,
  findToken,
  presentProposal,
  proposalColumns,
  proposalFacts,
  recordContractEvent,
  retireTokens,
  type ProposalRow,
} from './proposals.repository';

export interface ProposalDeps {
  db: DataSource;
  jobs: JobQueue;
  env: Pick<Env, 'APP_URL' | 'PROPOSAL_LINK_DAYS'>;
}

/** Contracts that may be offered (new) dates: not yet under way, settled or withdrawn. */
const proposable: ContractStatus[] = ['draft', 'offered', 'agreed', 'turned-down'];

const statusAfter: Record<GrowerAnswer['kind'], ProposalStatus> = {
  confirm: 'confirmed',
  decline: 'declined',
  counter: 'countered',
};

/** The 410 a used, expired or replaced proposal answers with. */
export const proposalGone = () =>
  new AppError(
    410,
    'gone',
    'This proposal has already been answered, has been replaced by newer dates, or has expired.',
  );

/**
 * Delivery-date proposals: the planner offers a window; the grower confirms, declines or
 * suggests another, from an e-mailed single-use link or signed in to the portal. Each step is
 * recorded in the contract's history and told to the planners by e-mail and in the app.
 */
export class ProposalsService {
  constructor(private readonly deps: ProposalDeps) {}

  private get db() {
    return this.deps.db;
  }

  private appUrl(path: string) {
    return `${this.deps.env.APP_URL.replace(/\/+$/, '')}${path}`;
  }

  /** Offers a window: replaces any open proposal, issues three links, e-mails the grower. */
  async propose(actor: Actor, contractId: string, input: ProposalCreateRequest) {
    return this.db.transaction(async (tx) => {
      const contract = await contracts.get(tx, actor.operationId, contractId, true);
      if (contract.archivedAt) throw new AppError(409, 'conflict', 'This contract is archived.');
      if (input.version !== undefined && input.version !== contract.version)
        throw AppError.staleVersion(contract.version);
      if (!proposable.includes(contract.status))
        throw new AppError(
          409,
          'conflict',
          `A contract that is ${contract.status} takes no new delivery dates.`,
        );

      const replaced = returningRows<{ id: string }>(
        await tx.query(
          `UPDATE proposals SET status = 'superseded', version = version + 1, updated_at = now()
            WHERE operation_id = $1 AND contract_id = $2 AND status = 'open' RETURNING id`,
          [actor.operationId, contractId],
        ),
      );
      await retireTokens(
        tx,
        actor.operationId,
        replaced.map((r) => r.id),
      );

      const [proposal]: ProposalRow[] = await tx.query(
        `INSERT INTO proposals (operation_id, contract_id, delivery_start_on, delivery_end_on,
                                colonies, note, proposed_by, expires_at)
         VALUES ($1, $2, $3, $4, $5, $6, $7, now() + make_interval(days => $8))
         RETURNING ${proposalColumns}`,
        [
          actor.operationId,
          contractId,
          input.deliveryStartOn,
          input.deliveryEndOn,
          input.colonies,
          input.note ?? '',
          actor.id,
          this.deps.env.PROPOSAL_LINK_DAYS,
        ],
      );
      const links = {} as Record<ProposalPurpose, string>;
      for (const purpose of ['confirm', 'decline', 'counter'] as const) {
        const token = newLinkToken();
        await tx.query(
          `INSERT INTO proposal_tokens (operation_id, proposal_id, contract_id, purpose, token_sha256, expires_at)
           VALUES ($1, $2, $3, $4, $5, $6)`,
          [
            actor.operationId,
            proposal.id,
            contractId,
            purpose,
            tokenDigest(token),
            proposal.expires_at,
          ],
        );
        links[purpose] = this.appUrl(`/respond/${token}`);
      }

      const after = await contracts.update(tx, actor.operationId, contractId, contract.version, {
        status: 'offered',
      });
      await recordContractEvent(
        tx,
        actor.operationId,
        contractId,
        'offered',
        {
          proposalId: proposal.id,
          from: contract.status,
          to: 'offered',
          deliveryStartOn: proposal.delivery_start_on,
          deliveryEndOn: proposal.delivery_end_on,
          colonies: proposal.colonies,
          replaced: replaced.map((r) => r.id),
        },
        actor.id,
      );

      const facts = await proposalFacts(tx, proposal);
      const emailedTo = await growerContactAddresses(tx, actor.operationId, contract.growerId);
      const expiresOn = proposal.expires_at.toISOString().slice(0, 10);
      for (const to of emailedTo)
        await queueEmail(
          tx,
          this.deps.jobs,
          {
            operationId: actor.operationId,
            purpose: 'proposal',
            relatedKind: 'proposal',
            relatedId: proposal.id,
          },
          proposalEmail(to, facts, links, expiresOn),
        );
      return {
        proposal: presentProposal(proposal),
        contract: presentContract(after, actor),
        emailedTo,
      };
    });
  }

  /** Proposals of the operation (a grower: of their own contracts), newest first. */
  async list(actor: Actor, query: { contractId?: string; status?: ProposalStatus }) {
    const rows: ProposalRow[] = await this.db.query(
      `SELECT ${proposalColumns} FROM proposals
        WHERE operation_id = $1
          AND ($2::uuid IS NULL OR contract_id IN
                (SELECT id FROM contracts WHERE operation_id = $1 AND grower_id = $2))
          AND ($3::uuid IS NULL OR contract_id = $3)
          AND ($4::text IS NULL OR status = $4)
        ORDER BY created_at DESC, id
        LIMIT 200`,
      [
        actor.operationId,
        actor.role === 'grower' ? actor.growerId : null,
        query.contractId ?? null,
        query.status ?? null,
      ],
    );
    return { items: rows.map(presentProposal), total: rows.length };
  }

  /** A signed-in grower answers a proposal of their own contract from the portal. */
  async answerAsGrower(actor: Actor, proposalId: string, answer: GrowerAnswer) {
    return this.db.transaction(async (tx) => {
      const proposal = await findProposal(tx, actor.operationId, proposalId);
      if (!proposal) throw AppError.notFound('Proposal');
      const contract = await contracts.get(tx, actor.operationId, proposal.contract_id, true);
      if (contract.growerId !== actor.growerId) throw AppError.notFound('Proposal');
      if (proposal.status !== 'open')
        throw new AppError(409, 'conflict', `This proposal is already ${proposal.status}.`);
      const answered = await this.applyAnswer(tx, proposal, answer, 'portal', actor.id);
      const updated = await contracts.get(tx, actor.operationId, proposal.contract_id);
      return { proposal: presentProposal(answered), contract: presentContract(updated, actor) };
    });
  }

  /**
   * Answers through an e-mailed link. The token decides the answer's kind; a form may add a note
   * (and, to counter, a window). Unknown → 404; used, expired or replaced → 410.
   */
  async answerByLink(
    token: string,
    form: (purpose: ProposalPurpose) => GrowerAnswer,
  ): Promise<{ purpose: ProposalPurpose; proposal: ProposalRow; facts: ProposalFacts }> {
    const digest = tokenDigest(token);
    return this.db.transaction(async (tx) => {
      const link = await findToken(tx, digest);
      if (!link) throw AppError.notFound('Link');
      const answer = form(link.purpose); // a bad form throws before anything is written
      // Lock order everywhere: contract, then proposal, then tokens.
      await contracts.get(tx, link.operation_id, link.contract_id, true);
      if (!(await consumeToken(tx, digest))) throw proposalGone();
      const proposal = await findProposal(tx, link.operation_id, link.proposal_id);
      if (!proposal || proposal.status !== 'open') throw proposalGone();
      const answered = await this.applyAnswer(tx, proposal, answer, 'link', null);
      return {
        purpose: link.purpose,
        proposal: answered,
        facts: await proposalFacts(tx, answered),
      };
    });
  }

  /** What the page behind a link shows; 404 unknown, 410 used or expired. */
  async viewByLink(token: string) {
    const link = await findToken(this.db.manager, tokenDigest(token));
    if (!link) throw AppError.notFound('Link');
    if (link.used || link.expired) throw proposalGone();
    const proposal = await findProposal(this.db.manager, link.operation_id, link.proposal_id);
    if (!proposal || proposal.status !== 'open') throw proposalGone();
    const facts = await proposalFacts(this.db.manager, proposal);
    if (facts.contractStatus !== 'offered') throw proposalGone();
    return { purpose: link.purpose, facts };
  }

  /** Records the grower's answer on the proposal, the contract, its history, and tells planners. */
  private async applyAnswer(
    tx: EntityManager,
    proposal: ProposalRow,
    answer: GrowerAnswer,
    via: 'link' | 'portal',
    userId: string | null,
  ): Promise<ProposalRow> {
    const counter = answer.kind === 'counter' ? answer : null;
    const [answered] = returningRows<ProposalRow>(
      await tx.query(
        `UPDATE proposals
          SET status = $3, responded_at = now(), responded_via = $4, responded_by = $5,
              counter_start_on = $6, counter_end_on = $7, counter_colonies = $8,
              response_note = $9, version = version + 1, updated_at = now()
        WHERE operation_id = $1 AND id = $2 AND status = 'open' AND expires_at > now()
        RETURNING ${proposalColumns}`,
        [
          proposal.operation_id,
          proposal.id,
          statusAfter[answer.kind],
          via,
          userId,
          counter?.deliveryStartOn ?? null,
          counter?.deliveryEndOn ?? null,
          counter?.colonies ?? null,
          answer.note,
        ],
      ),
    );
    if (!answered) throw proposalGone();
    await retireTokens(tx, proposal.operation_id, [proposal.id]);

    const facts = await proposalFacts(tx, proposal);
    // Withdrawn, archived or otherwise moved on since the dates were sent: the offer lapsed.
    const [contract] = await tx.query(
      `SELECT status, archived_at FROM contracts WHERE operation_id = $1 AND id = $2`,
      [proposal.operation_id, proposal.contract_id],
    );
    if (contract.archived_at || contract.status !== 'offered') throw proposalGone();

    if (answer.kind === 'confirm')
      await tx.query(
        `UPDATE contracts SET status = 'agreed', delivery_start_on = $3, delivery_end_on = $4,
                colonies_ordered = $5, version = version + 1, updated_at = now()
          WHERE operation_id = $1 AND id = $2`,
        [
          proposal.operation_id,
          proposal.contract_id,
          proposal.delivery_start_on,
          proposal.delivery_end_on,
          proposal.colonies,
        ],
      );
    if (answer.kind === 'decline')
      await tx.query(
        `UPDATE contracts SET status = 'turned-down', version = version + 1, updated_at = now()
          WHERE operation_id = $1 AND id = $2`,
        [proposal.operation_id, proposal.contract_id],
      );

    const kind = { confirm: 'agreed', decline: 'turned-down', counter: 'countered' }[answer.kind];
    await recordContractEvent(
      tx,
      proposal.operation_id,
      proposal.contract_id,
      kind,
      {
        proposalId: proposal.id,
        via,
        deliveryStartOn: proposal.delivery_start_on,
        deliveryEndOn: proposal.delivery_end_on,
        colonies: proposal.colonies,
        ...(counter
          ? {
              counter: {
                deliveryStartOn: counter.deliveryStartOn,
                deliveryEndOn: counter.deliveryEndOn,
                colonies: counter.colonies,
              },
            }
          : {}),
        ...(answer.note ? { note: answer.note } : {}),
        ...(answer.kind === 'counter' ? {} : { from: 'offered', to: kind }),
      },
      userId,
    );

    const window = humanWindow(proposal.delivery_start_on, proposal.delivery_end_on);
    await notifyPlanners(tx, proposal.operation_id, {
      kind: `proposal-${statusAfter[answer.kind]}` as 'proposal-confirmed',
      title: {
        confirm: `${facts.growerName} confirmed ${window}`,
        decline: `${facts.growerName} declined ${window}`,
        counter: `${facts.growerName} suggests other dates`,
      }[answer.kind],
      body: counter
        ? `Suggested ${humanWindow(counter.deliveryStartOn, counter.deliveryEndOn)}${answer.note ? `: ${answer.note}` : ''}`
        : answer.note,
      relatedKind: 'contract',
      relatedId: proposal.contract_id,
    });
    const contractUrl = this.appUrl(`/contracts/${proposal.contract_id}`);
    const purpose = {
      operationId: proposal.operation_id,
      relatedKind: 'proposal',
      relatedId: proposal.id,
    };
    for (const planner of await plannerRecipients(tx, proposal.operation_id))
      await queueEmail(
        tx,
        this.deps.jobs,
        { ...purpose, purpose: 'proposal-answer' },
        answerEmail(planner.email, facts, answer, contractUrl),
      );
    if (answer.kind === 'confirm')
      for (const to of await growerContactAddresses(tx, proposal.operation_id, facts.growerId))
        await queueEmail(
          tx,
          this.deps.jobs,
          { ...purpose, purpose: 'dates-agreed' },
          agreedEmail(to, facts),
        );
    return answered;
  }
}
