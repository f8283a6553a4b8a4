import type { Metadata } from 'next';
import Link from 'next/link';
import { RecordLink } from '@/components/desk/columns';
import { PlainTable } from '@/components/ui/plain-table';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getSegment } from '@/lib/data/segments';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { formatLength } from '@/lib/units';
import { PageHeader } from '@/components/ui/page-header';
import { EditSegment } from './edit-segment';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';
import { EmptyState } from '@/components/ui/empty-state';

export const metadata: Metadata = { title: 'Segment' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const segment = await recordForPage((await params).id, (id) => getSegment(user, id));
  const { timeZone, unitSystem } = await getCompany(user);
  const short = (mm: number, decimals?: number) =>
    formatLength(mm, unitSystem, 'short', decimals === undefined ? {} : { decimals });
  const long = (mm: number) => formatLength(mm, unitSystem, 'long');
  const ends = `${segment.fromAccessPoint.label} → ${segment.toAccessPoint?.label ?? 'open end'}`;
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: `/sites/${segment.siteId}`, label: segment.site.name }}
        title={`Segment ${segment.label}`}
        description={`${ends}${segment.archivedAt ? ' · archived' : ''}`}
        actions={
          !segment.archivedAt && (
            <ArchiveButton url={`/api/segments/${segment.id}`} what="segment" backTo={`/sites/${segment.siteId}`} />
          )
        }
      />
      <dl className={cn(cardClass, 'grid grid-cols-2 gap-4 text-sm md:grid-cols-4')}>
        <div>
          <dt className="text-slate-500">Site</dt>
          <dd className="font-medium">
            {segment.site.addressLine}, {segment.site.city}
          </dd>
        </div>
        <div>
          <dt className="text-slate-500">Customer</dt>
          <dd className="font-medium">{segment.site.customer?.name ?? '—'}</dd>
        </div>
        <div>
          <dt className="text-slate-500">From access point</dt>
          <dd className="font-medium">
            {segment.fromAccessPoint.label} ({label(segment.fromAccessPoint.kind)})
          </dd>
        </div>
        <div>
          <dt className="text-slate-500">To access point</dt>
          <dd className="font-medium">
            {segment.toAccessPoint
              ? `${segment.toAccessPoint.label} (${label(segment.toAccessPoint.kind)})`
              : 'Open end'}
          </dd>
        </div>
        <div>
          <dt className="text-slate-500">Material</dt>
          <dd className="font-medium">{label(segment.material)}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Nominal size</dt>
          <dd className="font-medium">{short(segment.nominalSizeMm)}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Inside diameter</dt>
          <dd className="font-medium">{short(Number(segment.insideDiameterMm), unitSystem === 'imperial' ? 2 : 1)}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Length</dt>
          <dd className="font-medium">{long(segment.lengthMm)}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Depth</dt>
          <dd className="font-medium">{segment.depthMm === null ? '—' : long(segment.depthMm)}</dd>
        </div>
      </dl>
      <EditSegment user={user} segment={segment} unitSystem={unitSystem} />
      <section aria-labelledby="repairs-heading">
        <h2 id="repairs-heading" className="mb-2 text-lg font-semibold">
          Repairs on this segment
        </h2>
        {segment.repairs.length === 0 ? (
          <EmptyState>No repairs planned on this segment.</EmptyState>
        ) : (
          <PlainTable
            caption="Repairs on this segment"
            headers={['Repair', 'Job', 'Distance', 'Defect', 'Grade', 'Status']}
          >
            {segment.repairs.map((repair) => (
              <tr key={repair.id}>
                <td className="px-3 py-2">
                  <RecordLink href={`/repairs/${repair.id}`}>Repair {repair.position}</RecordLink>
                </td>
                <td className="px-3 py-2">
                  {repair.job ? (
                    <Link href={`/jobs/${repair.job.id}`} className="hover:underline">
                      {repair.job.number}
                    </Link>
                  ) : (
                    '—'
                  )}
                </td>
                <td className="px-3 py-2">{long(repair.distanceMm)}</td>
                <td className="px-3 py-2">
                  {label(repair.defectType)} ({short(repair.defectLengthMm)})
                </td>
                <td className="px-3 py-2">{repair.conditionGrade}</td>
                <td className="px-3 py-2">{label(repair.status)}</td>
              </tr>
            ))}
          </PlainTable>
        )}
      </section>
      <AuditHistory user={user} entityType="segment" entityId={segment.id} timeZone={timeZone} />
    </div>
  );
}
