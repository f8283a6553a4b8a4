import type { Metadata } from 'next';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { RepairEvidence } from '@/components/evidence/repair-evidence';
import { StatusBadge } from '@/components/ui/badge';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getRepair, getRepairPlan } from '@/lib/data/repairs';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { REPAIRS_EDITABLE } from '@/lib/jobs/status';
import { recordForPage } from '@/lib/server/page-record';
import { formatLength } from '@/lib/units';
import { listRepairAttempts } from '@/lib/data/redo';
import { InstallAttempts } from './install-attempts';
import { PlanPanel } from './plan-panel';
import { PageHeader } from '@/components/ui/page-header';
import { EditRepair } from './edit-repair';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

export const metadata: Metadata = { title: 'Repair' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const repair = await recordForPage((await params).id, (id) => getRepair(user, id));
  const [{ unitSystem, timeZone }, plan] = await Promise.all([getCompany(user), getRepairPlan(user, repair.id, {})]);
  const jobOpen = !repair.job.archivedAt && REPAIRS_EDITABLE.includes(repair.job.status);
  const editable = jobOpen && repair.installCount === 0 && repair.status === 'planned';
  const segment = repair.segment;
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: `/jobs/${repair.job.id}`, label: `Job ${repair.job.number}` }}
        title={`Repair ${repair.position} · job ${repair.job.number}`}
        badge={<StatusBadge status={repair.status} />}
        description={`${label(repair.defectType)}, grade ${repair.conditionGrade}`}
        actions={
          repair.status !== 'cancelled' && (
            <ArchiveButton url={`/api/repairs/${repair.id}`} what="repair" backTo={`/jobs/${repair.job.id}`} />
          )
        }
      />
      <dl className={cn(cardClass, 'grid grid-cols-2 gap-4 text-sm md:grid-cols-4')}>
        <div>
          <dt className="text-slate-500">Segment</dt>
          <dd className="font-medium">
            {segment.label} · {label(segment.material)}
          </dd>
        </div>
        <div>
          <dt className="text-slate-500">Inside diameter</dt>
          <dd className="font-medium">{formatLength(segment.insideDiameterMm, unitSystem)}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Distance from access point</dt>
          <dd className="font-medium">
            {formatLength(repair.distanceMm, unitSystem, 'long')}
            {segment.fromAccessPoint ? ` from ${segment.fromAccessPoint.label}` : ''}
          </dd>
        </div>
        <div>
          <dt className="text-slate-500">Defect length</dt>
          <dd className="font-medium">{formatLength(repair.defectLengthMm, unitSystem)}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Owner’s defect code</dt>
          <dd className="font-medium">{repair.ownerDefectCode ?? '—'}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Clock position</dt>
          <dd className="font-medium">{repair.clockPosition ?? '—'}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Planned packer</dt>
          <dd className="font-medium">{repair.plannedPacker?.name ?? '—'}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Installs</dt>
          <dd className="font-medium">{repair.installCount}</dd>
        </div>
        {repair.notes && (
          <div className="col-span-full">
            <dt className="text-slate-500">Notes</dt>
            <dd className="whitespace-pre-line">{repair.notes}</dd>
          </div>
        )}
      </dl>
      {jobOpen && <EditRepair user={user} repair={repair} unitSystem={unitSystem} />}
      <PlanPanel repairId={repair.id} initial={plan} editable={editable} />
      <InstallAttempts attempts={await listRepairAttempts(user, repair.id)} timeZone={timeZone} />
      <RepairEvidence repairId={repair.id} />
      <AuditHistory user={user} entityType="repair" entityId={repair.id} timeZone={timeZone} />
    </div>
  );
}
