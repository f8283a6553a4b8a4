import type { Metadata } from 'next';
import Link from 'next/link';
import { AuditHistory } from '@/components/desk/audit-history';
import { Badge } from '@/components/ui/badge';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getUser } from '@/lib/data/users';
import { ADMIN_ONLY, label } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { UserActions } from '../user-actions';
import { EditUserForm } from '../user-form';
import { PageHeader } from '@/components/ui/page-header';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

export const metadata: Metadata = { title: 'User' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const admin = await requirePageUser(ADMIN_ONLY);
  const user = await recordForPage((await params).id, (id) => getUser(admin, id));
  const { timeZone } = await getCompany(admin);
  const isSelf = user.id === admin.id;
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/admin/users', label: 'Users' }}
        title={user.name}
        description={
          <>
            {user.email} · {label(user.role)} ·{' '}
            {user.active ? <Badge tone="safe">Active</Badge> : <Badge tone="missed">Deactivated</Badge>}
          </>
        }
        actions={<UserActions user={user} isSelf={isSelf} />}
      />
      <EditUserForm user={user} isSelf={isSelf} />
      <section className={cn(cardClass, 'text-sm')}>
        <h2 className="mb-2 text-sm font-semibold uppercase tracking-wide text-slate-600">Crews</h2>
        {user.crews.length === 0 ? (
          <p className="text-slate-500">On no crew.</p>
        ) : (
          <ul className="flex flex-wrap gap-2">
            {user.crews.map((crew) => (
              <li key={crew.id}>
                <Link href={`/admin/crews/${crew.id}`} className="text-brand-700 hover:underline">
                  {crew.name}
                </Link>
                {crew.archivedAt && <span className="text-xs text-slate-500"> (archived)</span>}
              </li>
            ))}
          </ul>
        )}
      </section>
      <AuditHistory user={admin} entityType="user" entityId={user.id} timeZone={timeZone} />
    </div>
  );
}
