import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { ResinSystemForm } from '../resin-system-form';
import { PageHeader } from '@/components/ui/page-header';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'New resin system' };

export default async function Page() {
  const user = await requirePageUser(ADMIN_ONLY);
  const { unitSystem } = await getCompany(user);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/admin/resin-systems', label: 'Resin systems' }} title="New resin system" />
      <ResinSystemForm unitSystem={unitSystem} />
    </div>
  );
}
