import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { NewUserForm } from '../user-form';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'New user' };

export default async function Page() {
  await requirePageUser(ADMIN_ONLY);
  return (
    <div className="space-y-4">
      <Link href="/admin/users" className="text-sm text-brand-700 hover:underline">← Users</Link>
      <h1 className="text-2xl font-bold">New user</h1>
      <NewUserForm />
    </div>
  );
}
