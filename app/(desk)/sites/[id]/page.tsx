import type { Metadata } from 'next';
import Link from 'next/link';
import { RecordLink } from '@/components/desk/columns';
import { PlainTable } from '@/components/ui/plain-table';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { buttonVariants } from '@/components/ui/button';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getSite } from '@/lib/data/sites';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { formatLength } from '@/lib/units';
import { AccessPointsPanel } from './access-points-panel';
import { PageHeader } from '@/components/ui/page-header';
import { EditSection } from '@/components/desk/edit-section';
import { SiteForm } from '../site-form';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

export const metadata: Metadata = { title: 'Site' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const site = await recordForPage((await params).id, (id) => getSite(user, id));
  const { timeZone, unitSystem } = await getCompany(user);
  const pointLabel = new Map(site.accessPoints.map((point) => [point.id, point.label]));
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/sites', label: 'Sites' }}
        title={site.name}
        description={
          <>
            <Link href={`/customers/${site.customer.id}`} className="hover:underline">
              {site.customer.name}
            </Link>
            {site.archivedAt ? ' · archived' : ''}
          </>
        }
        actions={!site.archivedAt && <ArchiveButton url={`/api/sites/${site.id}`} what="site" backTo="/sites" />}
      />
      <dl className={cn(cardClass, 'grid grid-cols-2 gap-4 text-sm md:grid-cols-4')}>
        <div>
          <dt className="text-slate-500">Street address</dt>
          <dd className="font-medium">{site.addressLine}</dd>
        </div>
        <div>
          <dt className="text-slate-500">City</dt>
          <dd className="font-medium">{site.city}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Region</dt>
          <dd className="font-medium">{site.region ?? '—'}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Postal code</dt>
          <dd className="font-medium">{site.postalCode ?? '—'}</dd>
        </div>
        {site.notes && (
          <div className="col-span-full">
            <dt className="text-slate-500">Notes</dt>
            <dd className="whitespace-pre-line">{site.notes}</dd>
          </div>
        )}
      </dl>
      <EditSection label="Edit site">
        <SiteForm site={site} />
      </EditSection>
      <AccessPointsPanel siteId={site.id} accessPoints={site.accessPoints} unitSystem={unitSystem} />
      <section aria-labelledby="segments-heading">
        <div className="mb-2 flex items-center justify-between">
          <h2 id="segments-heading" className="text-lg font-semibold">
            Segments
          </h2>
          {!site.archivedAt && (
            <Link href={`/segments/new?siteId=${site.id}`} className={buttonVariants({ variant: 'secondary' })}>
              New segment
            </Link>
          )}
        </div>
        <PlainTable
          caption="Segments of this site"
          headers={['Segment', 'From → to', 'Material', 'Nominal', 'Inside diameter', 'Length']}
        >
          {site.segments.map((segment) => (
            <tr key={segment.id}>
              <td className="px-3 py-2">
                <RecordLink href={`/segments/${segment.id}`}>{segment.label}</RecordLink>
                {segment.archivedAt && <span className="ml-2 text-xs text-slate-500">(archived)</span>}
              </td>
              <td className="px-3 py-2">
                {pointLabel.get(segment.fromAccessPointId)} →{' '}
                {segment.toAccessPointId ? pointLabel.get(segment.toAccessPointId) : 'open end'}
              </td>
              <td className="px-3 py-2">{label(segment.material)}</td>
              <td className="px-3 py-2">{formatLength(segment.nominalSizeMm, unitSystem)}</td>
              <td className="px-3 py-2">
                {formatLength(Number(segment.insideDiameterMm), unitSystem, 'short', {
                  decimals: unitSystem === 'imperial' ? 2 : 1,
                })}
              </td>
              <td className="px-3 py-2">{formatLength(segment.lengthMm, unitSystem, 'long')}</td>
            </tr>
          ))}
          {site.segments.length === 0 && (
            <tr>
              <td colSpan={6} className="px-3 py-4 text-slate-500">
                No segments yet. Add the access points at both ends first.
              </td>
            </tr>
          )}
        </PlainTable>
      </section>
      <AuditHistory user={user} entityType="site" entityId={site.id} timeZone={timeZone} />
    </div>
  );
}
