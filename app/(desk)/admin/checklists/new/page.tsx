import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { ChecklistForm } from '../checklist-form';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'New check-list' };

export default async function Page() {
  await requirePageUser(ADMIN_ONLY);
  return (
    <div className="space-y-4">
      <Link href="/admin/checklists" className="text-sm text-brand-700 hover:underline">← Check-lists</Link>
      <h1 className="text-2xl font-bold">New check-list</h1>
      <ChecklistForm />
    </div>
  );
}
