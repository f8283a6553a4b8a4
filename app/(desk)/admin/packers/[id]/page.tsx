import type { Metadata } from 'next';
import Link from 'next/link';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getPacker } from '@/lib/data/packers';
import { recordForPage } from '@/lib/server/page-record';
import { packerToForm } from '@/lib/validation/packers';
import { PackerForm } from '../packer-form';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'Packer' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const packer = await recordForPage((await params).id, (id) => getPacker(user, id));
  const { unitSystem, timeZone } = await getCompany(user);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <Link href="/admin/packers" className="text-sm text-brand-700 hover:underline">← Packers</Link>
          <h1 className="mt-1 text-2xl font-bold">{packer.name}</h1>
          <p className="text-sm text-slate-600">Used on {packer.installCount} install(s){packer.archivedAt ? ' · archived' : ''}</p>
        </div>
        {!packer.archivedAt && <ArchiveButton url={`/api/packers/${packer.id}`} what="packer" backTo="/admin/packers" />}
      </div>
      <PackerForm id={packer.id} initial={packerToForm(packer, unitSystem)} unitSystem={unitSystem} />
      <AuditHistory user={user} entityType="packer" entityId={packer.id} timeZone={timeZone} />
    </div>
  );
}
