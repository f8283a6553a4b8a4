import type { Metadata } from 'next';
import Link from 'next/link';
import { ListPage } from '@/components/desk/list-page';
import { Badge } from '@/components/ui/badge';
import { requirePageUser } from '@/lib/auth/session';
import { listChecklistTemplates } from '@/lib/data/checklist-templates';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { checklistTemplateListQuerySchema } from '@/lib/validation/checklist-templates';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Check-lists' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const query = queryOrDefaults(checklistTemplateListQuerySchema, filledParams(raw));
  const list = await listChecklistTemplates(user, { ...query, pageSize: 100 });
  return (
    <ListPage
      title="Check-list templates"
      back={{ href: '/admin', label: 'Company' }}
      description="A new install takes the most recently saved active template."
      search={query.q}
      placeholder="Name"
      exportApi="/api/checklist-templates"
      params={raw}
      newHref="/admin/checklists/new"
      newLabel="New check-list"
      archived={{ value: query.archived, word: 'inactive' }}
    >
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
    </ListPage>
  );
}
