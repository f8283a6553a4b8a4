import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/session';
import { NewUserForm } from '../user-form';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'New user' };

export default async function Page() {
  await requirePageUser(['admin']);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/admin/users', label: 'Users' }} title="New user" />
      <NewUserForm />
    </div>
  );
}
