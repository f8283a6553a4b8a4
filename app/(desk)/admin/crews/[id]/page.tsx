import type { Metadata } from 'next';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getCrew, listCrewCandidates } from '@/lib/data/crews';
import { recordForPage } from '@/lib/server/page-record';
import { CrewForm } from '../crew-form';
import { CrewMembers } from '../crew-members';
import { RestoreCrewButton } from './restore-button';
import { PageHeader } from '@/components/ui/page-header';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'Crew' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const crew = await recordForPage((await params).id, (id) => getCrew(user, id));
  const [{ timeZone }, candidates] = await Promise.all([getCompany(user), listCrewCandidates(user)]);
  const archived = Boolean(crew.archivedAt);
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/admin/crews', label: 'Crews' }}
        title={crew.name}
        description={`Up to ${crew.dailyCapacity} jobs a day${archived ? ' · archived' : ''}`}
        actions={
          archived ? (
            <RestoreCrewButton crewId={crew.id} />
          ) : (
            <ArchiveButton url={`/api/crews/${crew.id}`} what="crew" backTo="/admin/crews" />
          )
        }
      />
      <CrewForm crew={crew} />
      <CrewMembers crewId={crew.id} members={crew.members} candidates={candidates} readOnly={archived} />
      <AuditHistory user={user} entityType="crew" entityId={crew.id} timeZone={timeZone} />
    </div>
  );
}
