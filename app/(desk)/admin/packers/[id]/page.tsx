import type { Metadata } from 'next';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getPacker } from '@/lib/data/packers';
import { recordForPage } from '@/lib/server/page-record';
import { packerToForm } from '@/lib/validation/packers';
import { PackerForm } from '../packer-form';
import { PageHeader } from '@/components/ui/page-header';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'Packer' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const packer = await recordForPage((await params).id, (id) => getPacker(user, id));
  const { unitSystem, timeZone } = await getCompany(user);
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/admin/packers', label: 'Packers' }}
        title={packer.name}
        description={
          <>
            Used on {packer.installCount} install(s){packer.archivedAt ? ' · archived' : ''}
          </>
        }
        actions={
          !packer.archivedAt && (
            <ArchiveButton url={`/api/packers/${packer.id}`} what="packer" backTo="/admin/packers" />
          )
        }
      />
      <PackerForm id={packer.id} initial={packerToForm(packer, unitSystem)} unitSystem={unitSystem} />
      <AuditHistory user={user} entityType="packer" entityId={packer.id} timeZone={timeZone} />
    </div>
  );
}
