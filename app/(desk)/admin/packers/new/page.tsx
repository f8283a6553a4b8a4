import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { PackerForm } from '../packer-form';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'New packer' };

export default async function Page() {
  const user = await requirePageUser(ADMIN_ONLY);
  const { unitSystem } = await getCompany(user);
  return (
    <div className="space-y-4">
      <Link href="/admin/packers" className="text-sm text-brand-700 hover:underline">← Packers</Link>
      <h1 className="text-2xl font-bold">New packer</h1>
      <PackerForm unitSystem={unitSystem} />
    </div>
  );
}
