import type { Metadata } from 'next';
import Link from 'next/link';
import { RecordLink } from '@/components/desk/columns';
import { PlainTable } from '@/components/ui/plain-table';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { StatusBadge } from '@/components/ui/badge';
import { ReportPanel } from '@/components/report/report-panel';
import { InvoicePanel } from '@/components/invoice/invoice-panel';
import { buttonVariants } from '@/components/ui/button';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { findJob } from '@/lib/data/jobs';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { REPAIRS_EDITABLE } from '@/lib/jobs/status';
import { recordForPage } from '@/lib/server/page-record';
import { formatLength } from '@/lib/units';
import { JobStatusActions } from './status-actions';
import { PageHeader } from '@/components/ui/page-header';
import { EditJob } from './edit-job';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

export const metadata: Metadata = { title: 'Job' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const job = await recordForPage((await params).id, (id) => findJob(user, id));
  const { unitSystem, timeZone } = await getCompany(user);
  const site = job.site;
  const open = !job.archivedAt && REPAIRS_EDITABLE.includes(job.status);
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/jobs', label: 'Jobs' }}
        title={`Job ${job.number}`}
        badge={
          <>
            <StatusBadge status={job.status} />
            {job.archivedAt && <span className="text-sm font-normal text-slate-500">(archived)</span>}
          </>
        }
        description={job.title}
        actions={
          !job.archivedAt && (
            <>
              <JobStatusActions jobId={job.id} status={job.status} />
              <ArchiveButton url={`/api/jobs/${job.id}`} what="job" backTo="/jobs" />
            </>
          )
        }
      />
      <dl className={cn(cardClass, 'grid grid-cols-2 gap-4 text-sm md:grid-cols-4')}>
        <div>
          <dt className="text-slate-500">Customer</dt>
          <dd className="font-medium">
            <Link href={`/customers/${job.customer.id}`} className="text-brand-700 hover:underline">
              {job.customer.name}
            </Link>
          </dd>
        </div>
        <div>
          <dt className="text-slate-500">Site</dt>
          <dd className="font-medium">
            {site.addressLine}, {site.city}
          </dd>
        </div>
        <div>
          <dt className="text-slate-500">Scheduled</dt>
          <dd className="font-medium">{job.scheduledDate ?? 'Not yet'}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Crew</dt>
          <dd className="font-medium">{job.crew?.name ?? 'None'}</dd>
        </div>
        {job.notes && (
          <div className="col-span-full">
            <dt className="text-slate-500">Notes</dt>
            <dd className="whitespace-pre-line">{job.notes}</dd>
          </div>
        )}
      </dl>
      {!job.archivedAt && <EditJob user={user} job={job} />}
      {job.reviewComment && (
        <p className="rounded-md bg-near-100 p-3 text-sm text-near-700">Office comment: {job.reviewComment}</p>
      )}
      <section aria-labelledby="repairs-heading">
        <div className="mb-2 flex items-center justify-between">
          <h2 id="repairs-heading" className="text-lg font-semibold">
            Repairs
          </h2>
          {open && (
            <Link href={`/repairs/new?jobId=${job.id}`} className={buttonVariants({ variant: 'secondary' })}>
              Add repair
            </Link>
          )}
        </div>
        <PlainTable
          headClassName="bg-slate-100 text-left text-xs uppercase text-slate-600"
          caption={`Repairs of job ${job.number}`}
          headers={['#', 'Segment', 'Distance', 'Defect', 'Grade', 'Clock', 'Patch', 'Status']}
        >
          {job.repairs.map((repair) => (
            <tr key={repair.id}>
              <td className="px-3 py-2">
                <RecordLink href={`/repairs/${repair.id}`}>Repair {repair.position}</RecordLink>
              </td>
              <td className="px-3 py-2">
                {repair.segment?.label} · {formatLength(Number(repair.segment?.insideDiameterMm), unitSystem)} ID
              </td>
              <td className="px-3 py-2">{formatLength(repair.distanceMm, unitSystem, 'long')}</td>
              <td className="px-3 py-2">
                {label(repair.defectType)} ({formatLength(repair.defectLengthMm, unitSystem)})
              </td>
              <td className="px-3 py-2">{repair.conditionGrade}</td>
              <td className="px-3 py-2">{repair.clockPosition ?? '—'}</td>
              <td className="px-3 py-2">
                {repair.plannedPatchLengthMm ? formatLength(repair.plannedPatchLengthMm, unitSystem) : '—'}
              </td>
              <td className="px-3 py-2">{label(repair.status)}</td>
            </tr>
          ))}
          {job.repairs.length === 0 && (
            <tr>
              <td colSpan={8} className="px-3 py-6 text-center text-slate-500">
                No repairs yet.
              </td>
            </tr>
          )}
        </PlainTable>
      </section>
      <section>
        <h2 className="mb-2 text-lg font-semibold">Access points</h2>
        <ul className="flex flex-wrap gap-2 text-sm">
          {(site.accessPoints ?? []).map((point) => (
            <li key={point.id} className="rounded bg-white px-3 py-1 ring-1 ring-slate-200">
              {point.label} · {label(point.kind)}
            </li>
          ))}
        </ul>
      </section>
      {/* Repair report (send + send log) */}
      <ReportPanel user={user} job={job} />
      <InvoicePanel user={user} job={job} unitSystem={unitSystem} timeZone={timeZone} />
      <AuditHistory user={user} entityType="job" entityId={job.id} timeZone={timeZone} />
    </div>
  );
}
