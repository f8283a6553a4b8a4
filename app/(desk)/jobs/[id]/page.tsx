import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { StatusBadge } from '@/components/ui/badge';
import { ReportPanel } from '@/components/report/report-panel';
import { InvoicePanel } from '@/components/invoice/invoice-panel';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getJob } from '@/lib/data/jobs';
import { DESK_ROLES, label } from '@/lib/domain';
import { formatLength } from '@/lib/units';
import { uuidSchema } from '@/lib/validation/common';

export const metadata: Metadata = { title: 'Job' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const { id } = await params;
  const job = uuidSchema.safeParse(id).success ? await getJob(user, id) : null;
  if (!job) notFound();
  const { unitSystem } = await getCompany(user);
  const site = job.site;
  return (
    <div className="space-y-6">
      <div>
        <Link href="/jobs" className="text-sm text-brand-700 hover:underline">← Jobs</Link>
        <h1 className="mt-1 flex items-center gap-3 text-2xl font-bold">
          Job {job.number} <StatusBadge status={job.status} />
        </h1>
        <p className="text-slate-600">{job.title}</p>
      </div>
      <dl className="grid grid-cols-2 gap-4 rounded-lg bg-white p-4 text-sm ring-1 ring-slate-200 md:grid-cols-4">
        <div><dt className="text-slate-500">Customer</dt><dd className="font-medium">{job.customer?.name}</dd></div>
        <div><dt className="text-slate-500">Site</dt><dd className="font-medium">{site.addressLine}, {site.city}</dd></div>
        <div><dt className="text-slate-500">Scheduled</dt><dd className="font-medium">{job.scheduledDate ?? 'Not yet'}</dd></div>
        <div><dt className="text-slate-500">Crew</dt><dd className="font-medium">{job.crew?.name ?? 'None'}</dd></div>
      </dl>
      {job.reviewComment && (
        <p className="rounded-md bg-near-100 p-3 text-sm text-near-700">Office comment: {job.reviewComment}</p>
      )}
      <section>
        <h2 className="mb-2 text-lg font-semibold">Repairs</h2>
        <table className="min-w-full rounded-lg bg-white text-sm ring-1 ring-slate-200">
          <thead className="bg-slate-100 text-left text-xs uppercase text-slate-600">
            <tr>
              <th className="px-3 py-2">#</th><th className="px-3 py-2">Segment</th><th className="px-3 py-2">Distance</th>
              <th className="px-3 py-2">Defect</th><th className="px-3 py-2">Grade</th><th className="px-3 py-2">Clock</th>
              <th className="px-3 py-2">Patch</th><th className="px-3 py-2">Status</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-slate-100">
            {(job.repairs ?? []).map((repair) => (
              <tr key={repair.id}>
                <td className="px-3 py-2">{repair.position}</td>
                <td className="px-3 py-2">{repair.segment?.label} · {formatLength(Number(repair.segment?.insideDiameterMm), unitSystem)} ID</td>
                <td className="px-3 py-2">{formatLength(repair.distanceMm, unitSystem, 'long')}</td>
                <td className="px-3 py-2">{label(repair.defectType)} ({formatLength(repair.defectLengthMm, unitSystem)})</td>
                <td className="px-3 py-2">{repair.conditionGrade}</td>
                <td className="px-3 py-2">{repair.clockPosition ?? '—'}</td>
                <td className="px-3 py-2">{repair.plannedPatchLengthMm ? formatLength(repair.plannedPatchLengthMm, unitSystem) : '—'}</td>
                <td className="px-3 py-2">{label(repair.status)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      <section>
        <h2 className="mb-2 text-lg font-semibold">Access points</h2>
        <ul className="flex flex-wrap gap-2 text-sm">
          {(site.accessPoints ?? []).map((point) => (
            <li key={point.id} className="rounded bg-white px-3 py-1 ring-1 ring-slate-200">{point.label} · {label(point.kind)}</li>
          ))}
        </ul>
      </section>
      {/* Repair report (send + send log) */}
      <ReportPanel job={job} />
      <InvoicePanel user={user} job={job} unitSystem={unitSystem} />
    </div>
  );
}
