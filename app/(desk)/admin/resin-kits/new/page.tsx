import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listResinSystems } from '@/lib/data/resin-systems';
import { resinSystemListQuerySchema } from '@/lib/validation/resin-systems';
import { ResinKitForm } from '../resin-kit-form';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'New resin kit' };

export default async function Page() {
  const user = await requirePageUser(ADMIN_ONLY);
  const [{ unitSystem }, systems] = await Promise.all([getCompany(user), listResinSystems(user, resinSystemListQuerySchema.parse({ pageSize: '100' }))]);
  return (
    <div className="space-y-4">
      <Link href="/admin/resin-kits" className="text-sm text-brand-700 hover:underline">← Resin kits</Link>
      <h1 className="text-2xl font-bold">New resin kit</h1>
      {systems.items.length === 0
        ? <p>Add a <Link href="/admin/resin-systems/new" className="text-brand-700 underline">resin system</Link> first: every kit belongs to one.</p>
        : <ResinKitForm unitSystem={unitSystem} systems={systems.items} />}
    </div>
  );
}
