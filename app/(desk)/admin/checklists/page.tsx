import type { Metadata } from 'next';
import Link from 'next/link';
import { FilterSelect, ListToolbar, exportHrefOf } from '@/components/desk/list-toolbar';
import { Badge } from '@/components/ui/badge';
import { requirePageUser } from '@/lib/auth/session';
import { listChecklistTemplates } from '@/lib/data/checklist-templates';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { checklistTemplateListQuerySchema } from '@/lib/validation/checklist-templates';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Check-lists' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const parsed = checklistTemplateListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : checklistTemplateListQuerySchema.parse({});
  const list = await listChecklistTemplates(user, { ...query, pageSize: 100 });
  return (
    <div className="space-y-4">
      <PageHeader
        back={{ href: '/admin', label: 'Company' }}
        title="Check-list templates"
        description="A new install takes the most recently saved active template."
      />
      <ListToolbar
        search={query.q}
        placeholder="Name"
        exportHref={exportHrefOf('/api/checklist-templates', raw)}
        newHref="/admin/checklists/new"
        newLabel="New check-list"
      >
        <FilterSelect
          name="archived"
          label="Inactive"
          value={query.archived === 'false' ? '' : query.archived}
          options={[
            { value: 'true', label: 'Include inactive' },
            { value: 'only', label: 'Only inactive' },
          ]}
        />
      </ListToolbar>
      <ul className="divide-y divide-slate-100 rounded-lg bg-white text-sm ring-1 ring-slate-200">
        {list.items.map((t) => (
          <li key={t.id} className="flex justify-between px-3 py-2">
            <Link href={`/admin/checklists/${t.id}`} className="font-semibold text-brand-700 hover:underline">
              {t.name}
            </Link>
            <span className="text-slate-600">
              {t.items.length} item(s) {!t.active && <Badge>inactive</Badge>}
            </span>
          </li>
        ))}
        {list.items.length === 0 && <li className="px-3 py-6 text-center text-slate-500">Nothing matches.</li>}
      </ul>
    </div>
  );
}
