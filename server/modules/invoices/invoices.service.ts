import type { DataSource, EntityManager } from 'typeorm';
import type { Env } from '../../config/env';
import { TenantRepository } from '../../db/tenant-repository';
import { AppError } from '../../errors/app-error';
import { isoOrNull } from '../../http/present';
import type { Actor } from '../../middleware/authorise';
import type { ContractStatus } from '../../../shared/schemas/contracts';
import type {
  InvoiceCreateRequest,
  InvoiceIssueRequest,
  InvoiceListQuery,
} from '../../../shared/schemas/invoices';
import { contracts } from '../contracts/contracts.service';
import { growerContactAddresses, queueEmail } from '../emails/email-outbox';
import type { JobQueue } from '../jobs/job-queue';
import { balanceLines, depositLines, totalOf } from './invoice-amounts';
import { invoiceEmail } from './invoice-email';
import { Invoice } from './invoice.entity';

export const invoices = new TenantRepository(Invoice, 'Invoice');

/** Days from issue to due date when the owner names none (net 30). */
export const DEFAULT_NET_DAYS = 30;

/** Contracts that may be billed: agreed and not yet settled, withdrawn or turned down. */
const billable: ContractStatus[] = ['agreed', 'in-bloom', 'released'];

export interface InvoiceDeps {
  db: DataSource;
  env: Pick<Env, 'APP_URL'>;
  /** The e-mail queue; without it issuing sends nothing. */
  jobs?: JobQueue;
}

/** What a list or detail adds to the stored invoice. */
interface InvoiceContext {
  paidCents: number;
  growerName: string;
  crop: string;
  season: number;
}

/** An invoice as each role may see it: growers never get the operation's internal notes. */
export function presentInvoice(invoice: Invoice, actor: Actor, context: InvoiceContext) {
  return {
    id: invoice.id,
    number: invoice.number,
    kind: invoice.kind,
    status: invoice.status,
    contractId: invoice.contractId,
    growerId: invoice.growerId,
    growerName: context.growerName,
    crop: context.crop,
    season: context.season,
    lines: invoice.lines,
    amountCents: invoice.amountCents,
    paidCents: context.paidCents,
    outstandingCents: invoice.status === 'void' ? 0 : invoice.amountCents - context.paidCents,
    issuedOn: invoice.issuedOn,
    dueOn: invoice.dueOn,
    paidAt: isoOrNull(invoice.paidAt),
    voidedAt: isoOrNull(invoice.voidedAt),
    basis: invoice.basis,
    ...(actor.role === 'grower' ? {} : { internalNotes: invoice.internalNotes }),
    version: invoice.version,
    createdAt: isoOrNull(invoice.createdAt),
  };
}

export type PresentedInvoice = ReturnType<typeof presentInvoice>;

/** Adds today's date plus `days` as YYYY-MM-DD (UTC). */
export function addDays(date: string, days: number): string {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

export const todayUtc = () => new Date().toISOString().slice(0, 10);

/**
 * Invoices of pollination contracts: computed from the contract and the ledger, numbered per
 * operation, issued (and e-mailed) to the grower, paid online or voided.
 */
export class InvoicesService {
  constructor(private readonly deps: InvoiceDeps) {}

  private get db() {
    return this.deps.db;
  }

  /** Payments received, grower name, crop and season for each invoice. */
  private async contextOf(db: DataSource | EntityManager, rows: Invoice[]) {
    const context = new Map<string, InvoiceContext>();
    if (rows.length === 0) return context;
    const found: Array<{
      id: string;
      paid: number;
      grower_name: string;
      crop: string;
      season: number;
    }> = await db.query(
      `SELECT i.id, COALESCE((SELECT SUM(p.amount_cents) FROM payments p WHERE p.invoice_id = i.id), 0)::int AS paid,
              g.name AS grower_name, c.crop, c.season
         FROM invoices i
         JOIN growers g ON g.id = i.grower_id
         JOIN contracts c ON c.id = i.contract_id
        WHERE i.operation_id = $1 AND i.id = ANY($2::uuid[])`,
      [rows[0].operationId, rows.map((r) => r.id)],
    );
    for (const r of found)
      context.set(r.id, {
        paidCents: r.paid,
        growerName: r.grower_name,
        crop: r.crop,
        season: r.season,
      });
    return context;
  }

  private async present(db: DataSource | EntityManager, invoice: Invoice, actor: Actor) {
    const context = await this.contextOf(db, [invoice]);
    return presentInvoice(invoice, actor, context.get(invoice.id) as InvoiceContext);
  }

  /** The invoice if the actor may see it: a grower's own only (another's reads as missing). */
  private async visible(db: DataSource | EntityManager, actor: Actor, id: string, lock = false) {
    const invoice = await invoices.get(db, actor.operationId, id, lock);
    if (actor.role === 'grower' && invoice.growerId !== actor.growerId)
      throw AppError.notFound('Invoice');
    return invoice;
  }

  async list(actor: Actor, query: InvoiceListQuery) {
    const page = await invoices.list(
      this.db,
      actor.operationId,
      { ...query, sort: 'number', order: 'desc' },
      (qb) => {
        if (actor.role === 'grower') qb.andWhere('record.growerId = :own', { own: actor.growerId });
        if (query.status) qb.andWhere('record.status = :status', { status: query.status });
        if (query.growerId)
          qb.andWhere('record.growerId = :growerId', { growerId: query.growerId });
        if (query.contractId)
          qb.andWhere('record.contractId = :contractId', { contractId: query.contractId });
      },
    );
    const context = await this.contextOf(this.db, page.items);
    return {
      items: page.items.map((i) => presentInvoice(i, actor, context.get(i.id) as InvoiceContext)),
      total: page.total,
    };
  }

  /** One invoice with what a printed copy needs: both parties and the payments received. */
  async get(actor: Actor, id: string) {
    const invoice = await this.visible(this.db, actor, id);
    const [parties]: Array<{ operation_name: string; billing_address: string }> =
      await this.db.query(
        `SELECT o.name AS operation_name, g.billing_address
           FROM operations o, growers g WHERE o.id = $1 AND g.id = $2`,
        [actor.operationId, invoice.growerId],
      );
    const payments: Array<{
      id: string;
      amount_cents: number;
      received_at: Date;
      provider_reference: string;
    }> = await this.db.query(
      `SELECT id, amount_cents, received_at, provider_reference FROM payments
        WHERE operation_id = $1 AND invoice_id = $2 ORDER BY received_at`,
      [actor.operationId, id],
    );
    return {
      ...(await this.present(this.db, invoice, actor)),
      operationName: parties?.operation_name ?? '',
      billingAddress: parties?.billing_address ?? '',
      payments: payments.map((p) => ({
        id: p.id,
        amountCents: p.amount_cents,
        receivedAt: p.received_at.toISOString(),
        ...(actor.role === 'grower' ? {} : { providerReference: p.provider_reference }),
      })),
    };
  }

  /** Computes and stores a draft deposit or balance invoice for a contract, numbered next. */
  async create(actor: Actor, input: InvoiceCreateRequest) {
    return this.db.transaction(async (tx) => {
      // Locked, so two owners billing one contract at once are served one after the other.
      const contract = await contracts
        .get(tx, actor.operationId, input.contractId, true)
        .catch(() => {
          throw AppError.validation([{ field: 'contractId', message: 'No such contract.' }]);
        });
      if (contract.archivedAt || !billable.includes(contract.status))
        throw new AppError(
          409,
          'conflict',
          `A ${contract.status} contract cannot be billed; it must be agreed, in bloom or released.`,
        );
      const live: Array<{ kind: string; status: string; number: number }> = await tx.query(
        `SELECT kind, status, number FROM invoices
          WHERE operation_id = $1 AND contract_id = $2 AND status <> 'void'`,
        [actor.operationId, contract.id],
      );
      const same = live.find((i) => i.kind === input.kind);
      if (same)
        throw new AppError(
          409,
          'conflict',
          `This contract already has a ${input.kind} invoice (number ${same.number}); void it first to bill again.`,
        );
      let computed;
      if (input.kind === 'deposit') {
        if (contract.depositCents <= 0)
          throw new AppError(409, 'conflict', 'This contract has no deposit to bill.');
        computed = depositLines(contract);
      } else {
        const openDeposit = live.find((i) => i.kind === 'deposit' && i.status !== 'paid');
        if (openDeposit)
          throw new AppError(
            409,
            'conflict',
            `Deposit invoice ${openDeposit.number} is still unpaid; collect or void it before billing the balance.`,
          );
        const [deposit]: Array<{ paid: number }> = await tx.query(
          `SELECT COALESCE(SUM(p.amount_cents), 0)::int AS paid
             FROM payments p JOIN invoices i ON i.id = p.invoice_id
            WHERE i.operation_id = $1 AND i.contract_id = $2 AND i.kind = 'deposit'`,
          [actor.operationId, contract.id],
        );
        computed = await balanceLines(tx, contract, deposit.paid);
        if (computed.basis.coloniesPlaced === 0)
          throw new AppError(
            409,
            'conflict',
            'No colonies are recorded at this contract’s sites in its delivery span; record the placement in the ledger first.',
          );
      }
      const number = await nextInvoiceNumber(tx, actor.operationId);
      const invoice = await invoices.insert(tx, actor.operationId, {
        contractId: contract.id,
        growerId: contract.growerId,
        number,
        kind: input.kind,
        status: 'draft',
        lines: computed.lines,
        amountCents: totalOf(computed.lines),
        basis: computed.basis,
        internalNotes: input.internalNotes ?? '',
      });
      return this.present(tx, invoice, actor);
    });
  }

  /** draft → sent: dates it, sets the due date (net 30 by default), e-mails the grower. */
  async issue(actor: Actor, id: string, input: InvoiceIssueRequest) {
    return this.db.transaction(async (tx) => {
      const invoice = await this.visible(tx, actor, id, true);
      if (invoice.status !== 'draft')
        throw new AppError(409, 'conflict', `This invoice is ${invoice.status}, not a draft.`);
      const issuedOn = todayUtc();
      const dueOn = input.dueOn ?? addDays(issuedOn, DEFAULT_NET_DAYS);
      if (dueOn < issuedOn)
        throw AppError.validation([{ field: 'dueOn', message: 'Due on or after today.' }]);
      const sent = await invoices.update(tx, actor.operationId, id, input.version, {
        status: 'sent',
        issuedOn,
        dueOn,
      });
      const presented = await this.present(tx, sent, actor);
      await this.emailGrower(tx, actor, presented, issuedOn, dueOn);
      return presented;
    });
  }

  private async emailGrower(
    tx: EntityManager,
    actor: Actor,
    invoice: PresentedInvoice,
    issuedOn: string,
    dueOn: string,
  ) {
    if (!this.deps.jobs) return;
    const [operation]: Array<{ name: string }> = await tx.query(
      `SELECT name FROM operations WHERE id = $1`,
      [actor.operationId],
    );
    const url = `${this.deps.env.APP_URL.replace(/\/+$/, '')}/invoices/${invoice.id}`;
    for (const to of await growerContactAddresses(tx, actor.operationId, invoice.growerId)) {
      await queueEmail(
        tx,
        this.deps.jobs,
        {
          operationId: actor.operationId,
          // The outbox's purpose list predates invoices; the column itself is free text.
          purpose: 'invoice',
          relatedKind: 'invoice',
          relatedId: invoice.id,
        },
        invoiceEmail(
          to,
          {
            operationName: operation?.name ?? 'Your beekeeper',
            growerName: invoice.growerName,
            number: invoice.number,
            kind: invoice.kind,
            crop: invoice.crop,
            season: invoice.season,
            amountCents: invoice.amountCents,
            issuedOn,
            dueOn,
          },
          url,
        ),
      );
    }
  }

  /** draft or sent → void, while nothing has been paid on it. */
  async void(actor: Actor, id: string, version: number) {
    return this.db.transaction(async (tx) => {
      const invoice = await this.visible(tx, actor, id, true);
      if (invoice.status === 'void' || invoice.status === 'paid')
        throw new AppError(409, 'conflict', `This invoice is already ${invoice.status}.`);
      const [paid]: Array<{ n: number }> = await tx.query(
        `SELECT count(*)::int AS n FROM payments WHERE invoice_id = $1`,
        [id],
      );
      if (paid.n > 0)
        throw new AppError(
          409,
          'conflict',
          'Money has been received on this invoice; it cannot be voided.',
        );
      const voided = await invoices.update(tx, actor.operationId, id, version, {
        status: 'void',
        voidedAt: new Date(),
      });
      return this.present(tx, voided, actor);
    });
  }

  /** The invoice as the payment routes need it (role checks already done by the caller). */
  async forPayment(tx: EntityManager, actor: Actor, id: string) {
    const invoice = await this.visible(tx, actor, id, true);
    return this.present(tx, invoice, actor);
  }
}

/**
 * The operation's next invoice number, in the caller's transaction: an advisory lock per
 * operation serialises numbering until commit, so parallel creations never share a number and
 * a rolled-back one leaves no gap. UNIQUE (operation_id, number) backs it up.
 */
export async function nextInvoiceNumber(tx: EntityManager, operationId: string): Promise<number> {
  await tx.query(`SELECT pg_advisory_xact_lock(hashtextextended('invoice-number:' || $1, 0))`, [
    operationId,
  ]);
  const [row]: Array<{ next: number }> = await tx.query(
    `SELECT COALESCE(MAX(number), 0)::int + 1 AS next FROM invoices WHERE operation_id = $1`,
    [operationId],
  );
  return row.next;
}
