import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { listCustomerChoices } from '@/lib/data/sites';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { SiteForm } from '../site-form';

export const metadata: Metadata = { title: 'New site' };

export default async function Page({ searchParams }: { searchParams: Promise<{ customerId?: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const [{ customerId }, customers] = await Promise.all([searchParams, listCustomerChoices(user)]);
  // Preselect only a customer the select offers; anything else starts blank.
  const preselected = customers.some((c) => c.id === customerId) ? customerId : undefined;
  return (
    <div className="space-y-4">
      <Link href={preselected ? `/customers/${preselected}` : '/sites'} className="text-sm text-brand-700 hover:underline">
        ← {preselected ? customers.find((c) => c.id === preselected)?.name : 'Sites'}
      </Link>
      <h1 className="text-2xl font-bold">New site</h1>
      <SiteForm customers={customers} customerId={preselected} />
    </div>
  );
}
