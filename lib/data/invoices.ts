import 'server-only';
import { Op, type InferAttributes, type Transaction } from 'sequelize';
import { Customer, Invoice, InvoiceLine, Job, Repair, Site } from '@/models';
import { sequelize } from '@/lib/data/db';
import { changedFields, recordAudit } from '@/lib/data/audit';
import { AppError, notFound } from '@/lib/server/errors';
import { invoiceTotals, percentToBp } from '@/lib/invoice/money';
import type { SessionUser } from '@/lib/auth/session';
import type {
  InvoiceInput,
  InvoiceListQuery,
  invoiceActionSchema,
  invoiceLineSchema,
  invoicePatchSchema,
} from '@/lib/validation/invoices';
import type { z } from 'zod';
import { allOf, pageOf, searchWhere, windowOf } from './list';
import { assertOfficeWriter } from './scope';
import { closeCheckoutOf } from './payments';
import { findOwnRowLocked, lockOwnRow } from './records';

const ENTITY = 'invoice';
type Line = z.output<typeof invoiceLineSchema>;

export type InvoiceDetail = InferAttributes<Invoice> & {
  lines: InferAttributes<InvoiceLine>[];
  job: Pick<InferAttributes<Job>, 'id' | 'number' | 'status'> & {
    customer: Pick<InferAttributes<Customer>, 'id' | 'name' | 'email'>;
    site: Pick<InferAttributes<Site>, 'id' | 'addressLine' | 'city'>;
  };
};

const detailInclude = [
  { model: InvoiceLine, as: 'lines' },
  {
    model: Job,
    as: 'job',
    attributes: ['id', 'number', 'status'],
    include: [
      { model: Customer, as: 'customer', attributes: ['id', 'name', 'email'] },
      { model: Site, as: 'site', attributes: ['id', 'addressLine', 'city'] },
    ],
  },
];

export type InvoiceListResponse = Awaited<ReturnType<typeof listInvoices>>;

export async function listInvoices(user: SessionUser, query: InvoiceListQuery, exportAll = false) {
  assertOfficeWriter(user); // invoices are the office's business: field roles read none either
  const { rows, count } = await Invoice.findAndCountAll({
    where: allOf(
      { companyId: user.companyId },
      query.status ? { status: query.status } : undefined,
      query.jobId ? { jobId: query.jobId } : undefined,
      searchWhere(query.q, ['number', '$job.number$', '$job.customer.name$']),
    ),
    include: [
      {
        model: Job,
        as: 'job',
        attributes: ['id', 'number'],
        include: [{ model: Customer, as: 'customer', attributes: ['id', 'name'] }],
      },
    ],
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
    distinct: true,
  });
  return pageOf(
    rows.map(
      (row) =>
        row.get({ plain: true }) as InferAttributes<Invoice> & {
          job: { id: string; number: string; customer: { id: string; name: string } };
        },
    ),
    count,
    query,
  );
}

async function findDetail(where: { id?: string; jobId?: string; companyId: string }, transaction?: Transaction) {
  const invoice = await Invoice.findOne({
    where: where.jobId ? { ...where, status: { [Op.ne]: 'void' } } : where,
    include: detailInclude,
    order: [[{ model: InvoiceLine, as: 'lines' }, 'position', 'ASC']],
    transaction,
  });
  return invoice ? (invoice.get({ plain: true }) as InvoiceDetail) : null;
}

export async function getInvoice(user: SessionUser, id: string) {
  assertOfficeWriter(user);
  const invoice = await findDetail({ id, companyId: user.companyId });
  if (!invoice) throw notFound('Invoice');
  return invoice;
}

/** The job's live (not void) invoice, or null. */
export async function invoiceOfJob(companyId: string, jobId: string) {
  return findDetail({ jobId, companyId });
}

/** Writes the lines and the totals they make (in the caller's transaction). */
async function writeLines(invoice: Invoice, lines: Line[], taxRateBp: number, transaction: Transaction) {
  const totals = invoiceTotals(lines, taxRateBp);
  await InvoiceLine.destroy({ where: { invoiceId: invoice.id }, transaction });
  await InvoiceLine.bulkCreate(
    lines.map((line, index) => ({
      companyId: invoice.companyId,
      invoiceId: invoice.id,
      repairId: line.repairId ?? null,
      position: index + 1,
      description: line.description,
      quantity: line.quantity,
      unitPriceCents: line.unitPriceCents,
      amountCents: totals.amounts[index],
    })),
    { transaction },
  );
  await invoice.update(
    { taxRateBp, subtotalCents: totals.subtotalCents, taxCents: totals.taxCents, totalCents: totals.totalCents },
    { transaction },
  );
}

/** Repairs named on lines must be the job's own. */
async function assertRepairsOfJob(job: Job, lines: Line[], transaction: Transaction) {
  const ids = [...new Set(lines.map((line) => line.repairId).filter((id): id is string => Boolean(id)))];
  if (!ids.length) return;
  const found = await Repair.count({ where: { id: ids, jobId: job.id, companyId: job.companyId }, transaction });
  if (found !== ids.length)
    throw new AppError(422, 'A line names a repair that is not on this job.', {
      lines: ['A line names a repair that is not on this job.'],
    });
}

export async function createInvoice(user: SessionUser, input: InvoiceInput) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const job = await findOwnRowLocked(Job, user, input.jobId, transaction);
    if (!job) throw new AppError(422, 'That job was not found.', { jobId: ['Pick a job of your company'] });
    if (job.status === 'cancelled') throw new AppError(409, 'A cancelled job is not invoiced.');
    if (await Invoice.count({ where: { jobId: job.id, status: { [Op.ne]: 'void' } }, transaction })) {
      throw new AppError(409, `Job ${job.number} already has an invoice; edit it or void it first.`);
    }
    await assertRepairsOfJob(job, input.lines, transaction);
    const earlier = await Invoice.count({ where: { jobId: job.id }, transaction });
    const invoice = await Invoice.create(
      {
        companyId: user.companyId,
        jobId: job.id,
        number: `INV-${job.number}${earlier ? `-${earlier + 1}` : ''}`,
        currency: input.currency,
        dueOn: input.dueOn,
        notes: input.notes ?? null,
      },
      { transaction },
    );
    await writeLines(invoice, input.lines, percentToBp(input.taxRatePct), transaction);
    await recordAudit(
      user,
      {
        action: 'create',
        entityType: ENTITY,
        entityId: invoice.id,
        changes: { number: invoice.number, totalCents: invoice.totalCents },
      },
      transaction,
    );
    return (await findDetail({ id: invoice.id, companyId: user.companyId }, transaction))!;
  });
}

/** Edits a draft; an issued invoice is what the customer saw and is voided and re-made instead. */
export async function updateInvoice(user: SessionUser, id: string, patch: z.output<typeof invoicePatchSchema>) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const invoice = await lockOwnRow(Invoice, user, id, 'Invoice', transaction);
    if (invoice.status !== 'draft')
      throw new AppError(409, `Invoice ${invoice.number} is ${invoice.status}; only a draft can be edited.`);
    const job = (await Job.findByPk(invoice.jobId, { transaction }))!;
    const before = invoice.get({ plain: true });
    const { lines, taxRatePct, ...fields } = patch;
    await invoice.update(fields, { transaction });
    const taxRateBp = taxRatePct === undefined ? invoice.taxRateBp : percentToBp(taxRatePct);
    if (lines) await assertRepairsOfJob(job, lines, transaction);
    const current =
      lines ??
      (await InvoiceLine.findAll({ where: { invoiceId: id }, order: [['position', 'ASC']], transaction })).map((line) =>
        line.get({ plain: true }),
      );
    await writeLines(invoice, current, taxRateBp, transaction);
    const changes = changedFields(before, { ...fields, taxRateBp, totalCents: invoice.totalCents });
    if (lines) changes.lines = { from: null, to: lines.length };
    await recordAudit(user, { action: 'update', entityType: ENTITY, entityId: id, changes }, transaction);
    return (await findDetail({ id, companyId: user.companyId }, transaction))!;
  });
}

/** issue: draft → issued (the customer can see and pay it); void: draft or issued → void. */
export async function changeInvoiceStatus(
  user: SessionUser,
  id: string,
  { action, reason }: z.output<typeof invoiceActionSchema>,
) {
  assertOfficeWriter(user);
  return sequelize.transaction(async (transaction) => {
    const invoice = await lockOwnRow(Invoice, user, id, 'Invoice', transaction);
    if (action === 'issue') {
      if (invoice.status !== 'draft')
        throw new AppError(409, `Invoice ${invoice.number} is ${invoice.status}; only a draft can be issued.`);
      if (invoice.totalCents <= 0) throw new AppError(422, 'An invoice of nothing cannot be issued.');
      await invoice.update({ status: 'issued', issuedAt: new Date() }, { transaction });
    } else {
      if (invoice.status === 'paid' || invoice.status === 'void')
        throw new AppError(409, `Invoice ${invoice.number} is ${invoice.status} and cannot be voided.`);
      // A checkout the customer still has open must not take money for a void invoice (409 if it just did).
      await closeCheckoutOf(invoice);
      await invoice.update({ status: 'void' }, { transaction });
    }
    await recordAudit(user, { action, entityType: ENTITY, entityId: id, reason }, transaction);
    return (await findDetail({ id, companyId: user.companyId }, transaction))!;
  });
}
