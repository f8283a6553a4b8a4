import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getRepair, repairFormOptions } from '@/lib/data/repairs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { lengthFromSi } from '@/lib/units';
import { RepairForm } from '../../repair-form';

export const metadata: Metadata = { title: 'Edit repair' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const { id } = await params;
  const repair = await recordForPage(id, (repairId) => getRepair(user, repairId));
  const [{ segments }, { unitSystem }] = await Promise.all([repairFormOptions(user, repair.jobId), getCompany(user)]);
  if (!segments.some((s) => s.id === repair.segmentId)) segments.push(repair.segment);
  // Shown to the precision the office typed: thousandths of a foot or inch, whole millimetres.
  const shown = (mm: number, kind: 'short' | 'long') => Number(lengthFromSi(mm, unitSystem, kind).toFixed(unitSystem === 'imperial' ? 3 : kind === 'long' ? 3 : 0));
  return (
    <div className="space-y-4">
      <Link href={`/repairs/${id}`} className="text-sm text-brand-700 hover:underline">← Repair {repair.position} of job {repair.job.number}</Link>
      <h1 className="text-2xl font-bold">Edit repair</h1>
      <RepairForm
        jobId={repair.jobId}
        repairId={repair.id}
        segments={segments}
        unitSystem={unitSystem}
        initial={{
          segmentId: repair.segmentId, distance: shown(repair.distanceMm, 'long'), defectType: repair.defectType, conditionGrade: repair.conditionGrade,
          defectLength: shown(repair.defectLengthMm, 'short'), clockPosition: repair.clockPosition ?? '', notes: repair.notes ?? '',
          ownerDefectCode: repair.ownerDefectCode ?? '',
        }}
      />
    </div>
  );
}
