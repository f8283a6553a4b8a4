import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listResinSystems } from '@/lib/data/resin-systems';
import { resinSystemListQuerySchema } from '@/lib/validation/resin-systems';
import { ResinKitForm } from '../resin-kit-form';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'New resin kit' };

export default async function Page() {
  const user = await requirePageUser(['admin']);
  const [{ unitSystem }, systems] = await Promise.all([getCompany(user), listResinSystems(user, resinSystemListQuerySchema.parse({ pageSize: '100' }))]);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/admin/resin-kits', label: 'Resin kits' }} title="New resin kit" />
      {systems.items.length === 0
        ? <p>Add a <Link href="/admin/resin-systems/new" className="text-brand-700 underline">resin system</Link> first: every kit belongs to one.</p>
        : <ResinKitForm unitSystem={unitSystem} systems={systems.items} />}
    </div>
  );
}
