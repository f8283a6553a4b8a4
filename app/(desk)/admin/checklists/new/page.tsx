import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/session';
import { ChecklistForm } from '../checklist-form';
import { PageHeader } from '@/components/ui/page-header';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'New check-list' };

export default async function Page() {
  await requirePageUser(ADMIN_ONLY);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/admin/checklists', label: 'Check-lists' }} title="New check-list" />
      <ChecklistForm />
    </div>
  );
}
