import type { Metadata } from 'next';
import Link from 'next/link';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { buttonClass } from '@/components/ui/button';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getSegment } from '@/lib/data/segments';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { formatLength } from '@/lib/units';

export const metadata: Metadata = { title: 'Segment' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const segment = await recordForPage((await params).id, (id) => getSegment(user, id));
  const { timeZone, unitSystem } = await getCompany(user);
  const short = (mm: number, decimals?: number) => formatLength(mm, unitSystem, 'short', decimals === undefined ? {} : { decimals });
  const long = (mm: number) => formatLength(mm, unitSystem, 'long');
  const ends = `${segment.fromAccessPoint.label} → ${segment.toAccessPoint?.label ?? 'open end'}`;
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <Link href={`/sites/${segment.siteId}`} className="text-sm text-brand-700 hover:underline">← {segment.site.name}</Link>
          <h1 className="mt-1 text-2xl font-bold">Segment {segment.label}</h1>
          <p className="text-slate-600">{ends}{segment.archivedAt ? ' · archived' : ''}</p>
        </div>
        <div className="flex gap-2">
          <Link href={`/segments/${segment.id}/edit`} className={buttonClass('secondary')}>Edit</Link>
          {!segment.archivedAt && <ArchiveButton url={`/api/segments/${segment.id}`} what="segment" backTo={`/sites/${segment.siteId}`} />}
        </div>
      </div>
      <dl className="grid grid-cols-2 gap-4 rounded-lg bg-white p-4 text-sm ring-1 ring-slate-200 md:grid-cols-4">
        <div><dt className="text-slate-500">Site</dt><dd className="font-medium">{segment.site.addressLine}, {segment.site.city}</dd></div>
        <div><dt className="text-slate-500">Customer</dt><dd className="font-medium">{segment.site.customer?.name ?? '—'}</dd></div>
        <div><dt className="text-slate-500">From access point</dt><dd className="font-medium">{segment.fromAccessPoint.label} ({label(segment.fromAccessPoint.kind)})</dd></div>
        <div><dt className="text-slate-500">To access point</dt><dd className="font-medium">{segment.toAccessPoint ? `${segment.toAccessPoint.label} (${label(segment.toAccessPoint.kind)})` : 'Open end'}</dd></div>
        <div><dt className="text-slate-500">Material</dt><dd className="font-medium">{label(segment.material)}</dd></div>
        <div><dt className="text-slate-500">Nominal size</dt><dd className="font-medium">{short(segment.nominalSizeMm)}</dd></div>
        <div><dt className="text-slate-500">Inside diameter</dt><dd className="font-medium">{short(Number(segment.insideDiameterMm), unitSystem === 'imperial' ? 2 : 1)}</dd></div>
        <div><dt className="text-slate-500">Length</dt><dd className="font-medium">{long(segment.lengthMm)}</dd></div>
        <div><dt className="text-slate-500">Depth</dt><dd className="font-medium">{segment.depthMm === null ? '—' : long(segment.depthMm)}</dd></div>
      </dl>
      <section aria-labelledby="repairs-heading">
        <h2 id="repairs-heading" className="mb-2 text-lg font-semibold">Repairs on this segment</h2>
        {segment.repairs.length === 0 ? (
          <p className="rounded-lg bg-white p-4 text-sm text-slate-500 ring-1 ring-slate-200">No repairs planned on this segment.</p>
        ) : (
          <table className="min-w-full rounded-lg bg-white text-sm ring-1 ring-slate-200">
            <caption className="sr-only">Repairs on this segment</caption>
            <thead className="bg-slate-100 text-left text-xs uppercase tracking-wide text-slate-600">
              <tr>
                <th scope="col" className="px-3 py-2">Repair</th><th scope="col" className="px-3 py-2">Job</th>
                <th scope="col" className="px-3 py-2">Distance</th><th scope="col" className="px-3 py-2">Defect</th>
                <th scope="col" className="px-3 py-2">Grade</th><th scope="col" className="px-3 py-2">Status</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-slate-100">
              {segment.repairs.map((repair) => (
                <tr key={repair.id}>
                  <td className="px-3 py-2"><Link href={`/repairs/${repair.id}`} className="font-semibold text-brand-700 hover:underline">Repair {repair.position}</Link></td>
                  <td className="px-3 py-2">{repair.job ? <Link href={`/jobs/${repair.job.id}`} className="hover:underline">{repair.job.number}</Link> : '—'}</td>
                  <td className="px-3 py-2">{long(repair.distanceMm)}</td>
                  <td className="px-3 py-2">{label(repair.defectType)} ({short(repair.defectLengthMm)})</td>
                  <td className="px-3 py-2">{repair.conditionGrade}</td>
                  <td className="px-3 py-2">{label(repair.status)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
      <AuditHistory user={user} entityType="segment" entityId={segment.id} timeZone={timeZone} />
    </div>
  );
}
