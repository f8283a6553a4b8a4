import type { Metadata } from 'next';
import Link from 'next/link';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { Badge } from '@/components/ui/badge';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getResinKit } from '@/lib/data/resin-kits';
import { listResinSystems } from '@/lib/data/resin-systems';
import { formatInZone } from '@/lib/time/dates';
import { ADMIN_ONLY, label } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { formatVolume } from '@/lib/units';
import { resinKitToForm } from '@/lib/validation/resin-kits';
import { resinSystemListQuerySchema } from '@/lib/validation/resin-systems';
import { IntlScope } from '@/components/shell/intl-scope';
import { ResinKitForm } from '../resin-kit-form';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Resin kit' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const kit = await recordForPage((await params).id, (id) => getResinKit(user, id));
  const [{ unitSystem, timeZone }, systems] = await Promise.all([
    getCompany(user),
    listResinSystems(user, resinSystemListQuerySchema.parse({ pageSize: '100' })),
  ]);
  // The kit's own system stays in the choice even when archived.
  const choices = systems.items.some((s) => s.id === kit.resinSystemId)
    ? systems.items
    : [kit.resinSystem, ...systems.items];
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/admin/resin-kits', label: 'Resin kits' }}
        title={`Lot ${kit.lot}`}
        badge={kit.expired && <Badge tone="missed">expired</Badge>}
        description={
          <>
            <Link href={`/admin/resin-systems/${kit.resinSystemId}`} className="text-brand-700 hover:underline">
              {kit.resinSystem.name}
            </Link>{' '}
            · use by {kit.expiresOn} · {formatVolume(kit.quantityL, unitSystem)} on hand
            {kit.archivedAt ? ' · archived' : ''}
          </>
        }
        actions={
          !kit.archivedAt && (
            <ArchiveButton url={`/api/resin-kits/${kit.id}`} what="resin kit" backTo="/admin/resin-kits" />
          )
        }
      />
      <section aria-labelledby="installs-heading">
        <h2 id="installs-heading" className="mb-2 text-lg font-semibold">
          Installs that used this kit
        </h2>
        <ul className="divide-y divide-slate-100 rounded-lg bg-white text-sm ring-1 ring-slate-200">
          {kit.installs.map((install) => (
            <li key={install.id} className="flex flex-wrap justify-between gap-2 px-3 py-2">
              <span>
                {install.reviewHref ? (
                  <Link href={install.reviewHref} className="font-medium text-brand-700 hover:underline">
                    Job {install.job.number}
                    {install.job.title ? ` · ${install.job.title}` : ''}
                  </Link>
                ) : (
                  <>Job {install.job.number}</>
                )}
              </span>
              <span className="text-slate-600">
                {label(install.status)}
                {install.startedAt ? ` · ${formatInZone(install.startedAt, timeZone)}` : ''}
              </span>
            </li>
          ))}
          {kit.installs.length === 0 && <li className="px-3 py-4 text-slate-500">No install has used this kit yet.</li>}
        </ul>
      </section>
      <IntlScope namespaces={['scan']}>
        <ResinKitForm id={kit.id} initial={resinKitToForm(kit, unitSystem)} unitSystem={unitSystem} systems={choices} />
      </IntlScope>
      <AuditHistory user={user} entityType="resin_kit" entityId={kit.id} timeZone={timeZone} />
    </div>
  );
}
