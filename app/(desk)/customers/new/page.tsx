import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { CustomerForm } from '../customer-form';

export const metadata: Metadata = { title: 'New customer' };

export default async function Page() {
  await requirePageUser(DESK_ROLES);
  return (
    <div className="space-y-4">
      <Link href="/customers" className="text-sm text-brand-700 hover:underline">← Customers</Link>
      <h1 className="text-2xl font-bold">New customer</h1>
      <CustomerForm />
    </div>
  );
}
