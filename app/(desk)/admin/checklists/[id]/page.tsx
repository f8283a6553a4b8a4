import type { Metadata } from 'next';
import Link from 'next/link';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getChecklistTemplate } from '@/lib/data/checklist-templates';
import { getCompany } from '@/lib/data/company';
import { recordForPage } from '@/lib/server/page-record';
import { ChecklistForm } from '../checklist-form';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'Check-list' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const template = await recordForPage((await params).id, (id) => getChecklistTemplate(user, id));
  const { timeZone } = await getCompany(user);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <Link href="/admin/checklists" className="text-sm text-brand-700 hover:underline">← Check-lists</Link>
          <h1 className="mt-1 text-2xl font-bold">{template.name}</h1>
          <p className="text-sm text-slate-600">Used on {template.installCount} install(s){template.active ? '' : ' · inactive'}</p>
        </div>
        {template.active && <ArchiveButton url={`/api/checklist-templates/${template.id}`} what="check-list" backTo="/admin/checklists" />}
      </div>
      <ChecklistForm id={template.id} initial={{ name: template.name, active: template.active, items: template.items }} />
      <AuditHistory user={user} entityType="checklist_template" entityId={template.id} timeZone={timeZone} />
    </div>
  );
}
