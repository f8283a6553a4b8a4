import { randomUUID } from 'node:crypto';
import fc from 'fast-check';
import Stripe from 'stripe';
import { z } from 'zod';
import { POST as createInvoiceRoute } from '@/app/api/invoices/route';
import { INSTALL_EVENT_TYPES } from '@/lib/domain/vocabulary';
import { accessPointInputSchema, accessPointPatchSchema } from '@/lib/validation/access-points';
import { uploadRequestSchema } from '@/lib/validation/attachments';
import { checklistTemplateInputSchema, checklistTemplatePatchSchema } from '@/lib/validation/checklist-templates';
import { companyPatchSchema } from '@/lib/validation/company';
import { crewInputSchema, crewMembersSchema, crewPatchSchema } from '@/lib/validation/crews';
import { customerInputSchema, customerPatchSchema } from '@/lib/validation/customers';
import { createInstallSchema, eventPayloadSchemas, redoInstallSchema } from '@/lib/validation/install-events';
import { invoiceActionSchema, invoiceInputSchema, invoicePatchSchema } from '@/lib/validation/invoices';
import { jobInputSchema, jobPatchSchema } from '@/lib/validation/jobs';
import { packerInputSchema, packerPatchSchema } from '@/lib/validation/packers';
import { repairInputSchema, repairPatchSchema } from '@/lib/validation/repairs';
import { profilePatchSchema } from '@/lib/validation/profile';
import { sendReportSchema } from '@/lib/validation/report';
import { resinKitInputSchema, resinKitPatchSchema } from '@/lib/validation/resin-kits';
import { resinSystemInputSchema, resinSystemPatchSchema } from '@/lib/validation/resin-systems';
import { reviewDecisionSchema } from '@/lib/validation/reviews';
import { scheduleInputSchema } from '@/lib/validation/schedule';
import { segmentInputSchema, segmentPatchSchema } from '@/lib/validation/segments';
import { siteInputSchema, sitePatchSchema } from '@/lib/validation/sites';
import { passwordResetSchema, userInputSchema, userPatchSchema } from '@/lib/validation/users';
import { Attachment, Job } from '@/models';
import { call, jsonBody } from './call';
import { startInstall } from './installs';
import { withSession } from './session';
import type { InstallWorld } from './world';

// What the fuzz suite sends to each mutating endpoint: the zod schema its body is shaped from, who calls it
// (the role that gets furthest), and which row its `[id]` names. tests/integration/fuzz.test.ts fails on a
// mutating route of the tree that has no entry here.

export type FuzzTarget = {
  /** The body's schema; without one the endpoint reads no body and gets hostile values anyway. */
  schema?: z.ZodType;
  /** Who calls: the world's admin unless set. */
  as?: 'admin' | 'office' | 'foreman';
  /** The world row `[id]` names (made by `setup` when the world has none). */
  id?: (w: InstallWorld, made: Record<string, string>) => string;
  setup?: (w: InstallWorld) => Promise<Record<string, string>>;
  /** Per-key arbitraries instead of the schema's (keeps deliberately slow paths rare, aims ids at the setup's rows). */
  overrides?: (w: InstallWorld, made: Record<string, string>) => Record<string, fc.Arbitrary<unknown>>;
  /** Extra request headers made from the body text (a webhook's signature). */
  headers?: (text: string) => Record<string, string>;
  /** Query-string arbitrary (DELETE with `?reason=`). */
  query?: fc.Arbitrary<Record<string, string>>;
};

// bcrypt at cost 12 takes a quarter of a second on purpose: only a few bodies carry a password long enough.
const password = fc.oneof(
  { weight: 40, arbitrary: fc.string({ maxLength: 11 }) },
  { weight: 1, arbitrary: fc.string({ minLength: 12, maxLength: 30 }) },
);

/** One install tap per type, its payload shaped from that type's schema. */
const eventSchema = z.union(
  INSTALL_EVENT_TYPES.map((type) =>
    z.object({
      clientEventId: z.uuid(),
      type: z.literal(type),
      deviceTime: z.iso.datetime(),
      payload: eventPayloadSchemas[type],
      correctsEventId: z.uuid().optional(),
    }),
  ) as unknown as [z.ZodType, z.ZodType, ...z.ZodType[]],
);

/** What the payment provider posts: a checkout session for one of the world's invoices (or not). */
const webhookSchema = z.object({
  id: z.string().max(300),
  type: z.enum(['checkout.session.completed', 'checkout.session.expired', 'payment_intent.succeeded']),
  data: z.object({
    object: z.object({
      id: z.string(),
      payment_status: z.enum(['paid', 'unpaid']),
      amount_total: z.number().int(),
      currency: z.enum(['usd', 'eur', 'cad']),
      metadata: z.object({ invoiceId: z.uuid(), companyId: z.uuid() }),
    }),
  }),
});
const sign = (payload: string) => ({
  'stripe-signature': Stripe.webhooks.generateTestHeaderString({
    payload,
    secret: process.env.STRIPE_WEBHOOK_SECRET ?? 'whsec_missing',
  }),
});

async function makeInvoice(w: InstallWorld) {
  await Job.update({ status: 'approved' }, { where: { id: w.job.id } });
  const made = await withSession(w.office, () =>
    call(
      createInvoiceRoute,
      '/api/invoices',
      {},
      jsonBody('POST', {
        jobId: w.job.id,
        taxRatePct: 8.25,
        dueOn: '2026-12-31',
        lines: [{ description: 'Point repair', quantity: 1, unitPriceCents: 100_000, repairId: w.repair.id }],
      }),
    ),
  );
  if (made.status !== 201) throw new Error(`invoice setup answered ${made.status}: ${JSON.stringify(made.body)}`);
  return { invoice: made.body.id as string, company: w.company.id };
}

async function makeAttachment(w: InstallWorld) {
  const install = await withSession(w.foreman, () => startInstall(w));
  const row = await Attachment.create({
    companyId: w.company.id,
    jobId: w.job.id,
    repairId: w.repair.id,
    installId: install,
    kind: 'after',
    storageKey: `fuzz/${randomUUID()}.png`,
    contentType: 'image/png',
    byteSize: 1024,
    originalName: 'fuzz.png',
    uploadedById: w.foreman.id,
    status: 'ready',
  } as never);
  return { attachment: row.id as string, install };
}

const installOf = async (w: InstallWorld) => ({ install: await withSession(w.foreman, () => startInstall(w)) });

const first = (w: InstallWorld) => w.accessPoints[0].id;

export const FUZZ_TARGETS: Record<string, FuzzTarget> = {
  'PATCH /api/access-points/[id]': { schema: accessPointPatchSchema, id: first },
  'DELETE /api/access-points/[id]': { id: first },
  // Exactly one of repairId and installId, mostly the setup's install.
  'POST /api/attachments': {
    schema: uploadRequestSchema,
    setup: installOf,
    overrides: (w, made) => ({
      installId: fc.oneof(
        { weight: 4, arbitrary: fc.constantFrom(made.install, w.repair.id) },
        { weight: 1, arbitrary: fc.constant(undefined) },
      ),
      repairId: fc.oneof(
        { weight: 1, arbitrary: fc.constant(w.repair.id) },
        { weight: 3, arbitrary: fc.constant(undefined) },
      ),
    }),
  },
  'DELETE /api/attachments/[id]': {
    setup: makeAttachment,
    id: (_, m) => m.attachment,
    query: fc.record({ reason: fc.string({ maxLength: 600 }) }, { requiredKeys: [] }),
  },
  'POST /api/attachments/[id]/complete': { setup: makeAttachment, id: (_, m) => m.attachment },
  'POST /api/checklist-templates': { schema: checklistTemplateInputSchema },
  'PATCH /api/checklist-templates/[id]': { schema: checklistTemplatePatchSchema, id: (w) => w.checklist.id },
  'DELETE /api/checklist-templates/[id]': { id: (w) => w.checklist.id },
  'PATCH /api/company': { schema: companyPatchSchema },
  'PATCH /api/profile': { schema: profilePatchSchema, as: 'foreman' },
  'POST /api/crews': { schema: crewInputSchema },
  'PATCH /api/crews/[id]': { schema: crewPatchSchema, id: (w) => w.otherCrew.id },
  'DELETE /api/crews/[id]': { id: (w) => w.otherCrew.id },
  'PUT /api/crews/[id]/members': { schema: crewMembersSchema, id: (w) => w.otherCrew.id },
  'POST /api/customers': { schema: customerInputSchema },
  'PATCH /api/customers/[id]': { schema: customerPatchSchema, id: (w) => w.customer.id },
  'DELETE /api/customers/[id]': { id: (w) => w.customer.id },
  'POST /api/installs': { schema: createInstallSchema, as: 'foreman' },
  'POST /api/installs/[id]/events': { schema: eventSchema, as: 'foreman', setup: installOf, id: (_, m) => m.install },
  'POST /api/installs/[id]/review': { schema: reviewDecisionSchema, setup: installOf, id: (_, m) => m.install },
  // The install neither failed nor was sent back: a well-formed body meets the 409, the rest a 400.
  'POST /api/installs/[id]/redo': {
    schema: redoInstallSchema,
    as: 'foreman',
    setup: installOf,
    id: (_, m) => m.install,
  },
  'POST /api/invoices': {
    schema: invoiceInputSchema,
    setup: async (w) => {
      await Job.update({ status: 'approved' }, { where: { id: w.job.id } });
      return {};
    },
  },
  'PATCH /api/invoices/[id]': { schema: invoicePatchSchema, setup: makeInvoice, id: (_, m) => m.invoice },
  'POST /api/invoices/[id]/status': { schema: invoiceActionSchema, setup: makeInvoice, id: (_, m) => m.invoice },
  'POST /api/jobs': { schema: jobInputSchema },
  'PATCH /api/jobs/[id]': { schema: jobPatchSchema, id: (w) => w.job.id },
  'DELETE /api/jobs/[id]': { id: (w) => w.job.id },
  'POST /api/jobs/[id]/report': { schema: sendReportSchema, id: (w) => w.job.id },
  'DELETE /api/jobs/[id]/report-links': { id: (w) => w.job.id },
  'PUT /api/jobs/[id]/schedule': { schema: scheduleInputSchema, id: (w) => w.job.id },
  'DELETE /api/jobs/[id]/schedule': { id: (w) => w.job.id },
  'POST /api/packers': { schema: packerInputSchema },
  'PATCH /api/packers/[id]': { schema: packerPatchSchema, id: (w) => w.packer.id },
  'DELETE /api/packers/[id]': { id: (w) => w.packer.id },
  'POST /api/payments/webhook': { schema: webhookSchema, setup: makeInvoice, headers: sign },
  'POST /api/repairs': { schema: repairInputSchema },
  'PATCH /api/repairs/[id]': { schema: repairPatchSchema, id: (w) => w.repair.id },
  'DELETE /api/repairs/[id]': { id: (w) => w.repair.id },
  'POST /api/resin-kits': { schema: resinKitInputSchema },
  'PATCH /api/resin-kits/[id]': { schema: resinKitPatchSchema, id: (w) => w.resinKit.id },
  'DELETE /api/resin-kits/[id]': { id: (w) => w.resinKit.id },
  'POST /api/resin-systems': { schema: resinSystemInputSchema },
  'PATCH /api/resin-systems/[id]': { schema: resinSystemPatchSchema, id: (w) => w.resinSystem.id },
  'DELETE /api/resin-systems/[id]': { id: (w) => w.resinSystem.id },
  'POST /api/segments': { schema: segmentInputSchema },
  'PATCH /api/segments/[id]': { schema: segmentPatchSchema, id: (w) => w.segment.id },
  'DELETE /api/segments/[id]': { id: (w) => w.segment.id },
  'POST /api/sites': { schema: siteInputSchema },
  'PATCH /api/sites/[id]': { schema: sitePatchSchema, id: (w) => w.site.id },
  'DELETE /api/sites/[id]': { id: (w) => w.site.id },
  'POST /api/sites/[id]/access-points': { schema: accessPointInputSchema, id: (w) => w.site.id },
  'POST /api/users': { schema: userInputSchema, overrides: () => ({ password }) },
  'PATCH /api/users/[id]': { schema: userPatchSchema, id: (w) => w.technician.id },
  'POST /api/users/[id]/password': {
    schema: passwordResetSchema,
    overrides: () => ({ password }),
    id: (w) => w.technician.id,
  },
};

/** Every id of a world, for bodies that name rows (the own pool, or another company's). */
export function idsOf(w: InstallWorld, made: Record<string, string> = {}): string[] {
  return [
    w.company.id,
    w.admin.id,
    w.office.id,
    w.foreman.id,
    w.technician.id,
    w.otherTechnician.id,
    w.crew.id,
    w.otherCrew.id,
    w.customer.id,
    w.site.id,
    w.segment.id,
    ...w.accessPoints.map((a) => a.id),
    w.job.id,
    w.repair.id,
    w.resinSystem.id,
    w.resinKit.id,
    w.expiredKit.id,
    w.packer.id,
    w.checklist.id,
    ...Object.values(made),
  ];
}
