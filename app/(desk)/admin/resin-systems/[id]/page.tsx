import type { Metadata } from 'next';
import Link from 'next/link';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getResinSystem } from '@/lib/data/resin-systems';
import { recordForPage } from '@/lib/server/page-record';
import { resinSystemToForm } from '@/lib/validation/resin-systems';
import { ResinSystemForm } from '../resin-system-form';
import { PageHeader } from '@/components/ui/page-header';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'Resin system' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const system = await recordForPage((await params).id, (id) => getResinSystem(user, id));
  const { unitSystem, timeZone } = await getCompany(user);
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/admin/resin-systems', label: 'Resin systems' }}
        title={system.name}
        description={
          <>
            {system.kitCount} kit(s) · used on {system.installCount} install(s){system.archivedAt ? ' · archived' : ''}{' '}
            ·{' '}
            <Link href={`/admin/resin-kits?resinSystemId=${system.id}`} className="text-brand-700 hover:underline">
              its kits
            </Link>
          </>
        }
        actions={
          !system.archivedAt && (
            <ArchiveButton url={`/api/resin-systems/${system.id}`} what="resin system" backTo="/admin/resin-systems" />
          )
        }
      />
      <ResinSystemForm id={system.id} initial={resinSystemToForm(system, unitSystem)} unitSystem={unitSystem} />
      <AuditHistory user={user} entityType="resin_system" entityId={system.id} timeZone={timeZone} />
    </div>
  );
}
