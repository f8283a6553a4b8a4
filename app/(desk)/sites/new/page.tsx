import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/session';
import { listCustomerChoices } from '@/lib/data/sites';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { SiteForm } from '../site-form';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'New site' };

export default async function Page({ searchParams }: { searchParams: Promise<{ customerId?: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const [{ customerId }, customers] = await Promise.all([searchParams, listCustomerChoices(user)]);
  // Preselect only a customer the select offers; anything else starts blank.
  const preselected = customers.some((c) => c.id === customerId) ? customerId : undefined;
  return (
    <div className="space-y-4">
      <PageHeader
        back={
          preselected
            ? { href: `/customers/${preselected}`, label: customers.find((c) => c.id === preselected)?.name }
            : { href: '/sites', label: 'Sites' }
        }
        title="New site"
      />
      <SiteForm customers={customers} customerId={preselected} />
    </div>
  );
}
