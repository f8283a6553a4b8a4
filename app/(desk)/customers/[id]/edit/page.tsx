import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { getCustomer } from '@/lib/data/customers';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { CustomerForm } from '../../customer-form';

export const metadata: Metadata = { title: 'Edit customer' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const { id } = await params;
  const customer = await recordForPage(id, (customerId) => getCustomer(user, customerId));
  return (
    <div className="space-y-4">
      <Link href={`/customers/${id}`} className="text-sm text-brand-700 hover:underline">← {customer.name}</Link>
      <h1 className="text-2xl font-bold">Edit customer</h1>
      <CustomerForm customer={customer} />
    </div>
  );
}
