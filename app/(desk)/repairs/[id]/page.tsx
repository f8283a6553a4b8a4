import type { Metadata } from 'next';
import Link from 'next/link';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { RepairEvidence } from '@/components/evidence/repair-evidence';
import { StatusBadge } from '@/components/ui/badge';
import { buttonClass } from '@/components/ui/button';
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
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <Link href={`/jobs/${repair.job.id}`} className="text-sm text-brand-700 hover:underline">← Job {repair.job.number}</Link>
          <div className="mt-1 flex items-center gap-3">
            <h1 className="text-2xl font-bold">Repair {repair.position} · job {repair.job.number}</h1>
            <StatusBadge status={repair.status} />
          </div>
          <p className="text-slate-600">{label(repair.defectType)}, grade {repair.conditionGrade}</p>
        </div>
        <div className="flex gap-2">
          {jobOpen && <Link href={`/repairs/${repair.id}/edit`} className={buttonClass('secondary')}>Edit</Link>}
          {repair.status !== 'cancelled' && <ArchiveButton url={`/api/repairs/${repair.id}`} what="repair" backTo={`/jobs/${repair.job.id}`} />}
        </div>
      </div>
      <dl className="grid grid-cols-2 gap-4 rounded-lg bg-white p-4 text-sm ring-1 ring-slate-200 md:grid-cols-4">
        <div><dt className="text-slate-500">Segment</dt><dd className="font-medium">{segment.label} · {label(segment.material)}</dd></div>
        <div><dt className="text-slate-500">Inside diameter</dt><dd className="font-medium">{formatLength(segment.insideDiameterMm, unitSystem)}</dd></div>
        <div><dt className="text-slate-500">Distance from access point</dt><dd className="font-medium">{formatLength(repair.distanceMm, unitSystem, 'long')}{segment.fromAccessPoint ? ` from ${segment.fromAccessPoint.label}` : ''}</dd></div>
        <div><dt className="text-slate-500">Defect length</dt><dd className="font-medium">{formatLength(repair.defectLengthMm, unitSystem)}</dd></div>
        <div><dt className="text-slate-500">Owner’s defect code</dt><dd className="font-medium">{repair.ownerDefectCode ?? '—'}</dd></div>
        <div><dt className="text-slate-500">Clock position</dt><dd className="font-medium">{repair.clockPosition ?? '—'}</dd></div>
        <div><dt className="text-slate-500">Planned packer</dt><dd className="font-medium">{repair.plannedPacker?.name ?? '—'}</dd></div>
        <div><dt className="text-slate-500">Installs</dt><dd className="font-medium">{repair.installCount}</dd></div>
        {repair.notes && <div className="col-span-full"><dt className="text-slate-500">Notes</dt><dd className="whitespace-pre-line">{repair.notes}</dd></div>}
      </dl>
      <PlanPanel repairId={repair.id} initial={plan} editable={editable} />
      <InstallAttempts attempts={await listRepairAttempts(user, repair.id)} timeZone={timeZone} />
      <RepairEvidence repairId={repair.id} />
      <AuditHistory user={user} entityType="repair" entityId={repair.id} timeZone={timeZone} />
    </div>
  );
}
