import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { CrewForm } from '../crew-form';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'New crew' };

export default async function Page() {
  await requirePageUser(ADMIN_ONLY);
  return (
    <div className="space-y-4">
      <Link href="/admin/crews" className="text-sm text-brand-700 hover:underline">← Crews</Link>
      <h1 className="text-2xl font-bold">New crew</h1>
      <CrewForm />
    </div>
  );
}
