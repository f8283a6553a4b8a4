import type { Metadata } from 'next';
import Link from 'next/link';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getCrew, listCrewCandidates } from '@/lib/data/crews';
import { recordForPage } from '@/lib/server/page-record';
import { CrewForm } from '../crew-form';
import { CrewMembers } from '../crew-members';
import { RestoreCrewButton } from './restore-button';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'Crew' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const crew = await recordForPage((await params).id, (id) => getCrew(user, id));
  const [{ timeZone }, candidates] = await Promise.all([getCompany(user), listCrewCandidates(user)]);
  const archived = Boolean(crew.archivedAt);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <Link href="/admin/crews" className="text-sm text-brand-700 hover:underline">← Crews</Link>
          <h1 className="mt-1 text-2xl font-bold">{crew.name}</h1>
          <p className="text-slate-600">Up to {crew.dailyCapacity} jobs a day{archived ? ' · archived' : ''}</p>
        </div>
        {archived ? <RestoreCrewButton crewId={crew.id} /> : <ArchiveButton url={`/api/crews/${crew.id}`} what="crew" backTo="/admin/crews" />}
      </div>
      <CrewForm crew={crew} />
      <CrewMembers crewId={crew.id} members={crew.members} candidates={candidates} readOnly={archived} />
      <AuditHistory user={user} entityType="crew" entityId={crew.id} timeZone={timeZone} />
    </div>
  );
}
