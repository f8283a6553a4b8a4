import type { Metadata } from 'next';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getChecklistTemplate } from '@/lib/data/checklist-templates';
import { getCompany } from '@/lib/data/company';
import { recordForPage } from '@/lib/server/page-record';
import { ChecklistForm } from '../checklist-form';
import { PageHeader } from '@/components/ui/page-header';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'Check-list' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const template = await recordForPage((await params).id, (id) => getChecklistTemplate(user, id));
  const { timeZone } = await getCompany(user);
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/admin/checklists', label: 'Check-lists' }}
        title={template.name}
        description={
          <>
            Used on {template.installCount} install(s){template.active ? '' : ' · inactive'}
          </>
        }
        actions={
          template.active && (
            <ArchiveButton
              url={`/api/checklist-templates/${template.id}`}
              what="check-list"
              backTo="/admin/checklists"
            />
          )
        }
      />
      <ChecklistForm
        id={template.id}
        initial={{ name: template.name, active: template.active, items: template.items }}
      />
      <AuditHistory user={user} entityType="checklist_template" entityId={template.id} timeZone={timeZone} />
    </div>
  );
}
