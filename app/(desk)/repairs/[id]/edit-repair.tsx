import { EditSection } from '@/components/desk/edit-section';
import type { SessionUser } from '@/lib/auth/session';
import { repairFormOptions, type getRepair } from '@/lib/data/repairs';
import { lengthFromSi, type UnitSystem } from '@/lib/units';
import { RepairForm } from '../repair-form';

/** The repair's form on its page, in the company's units. */
export async function EditRepair({
  user,
  repair,
  unitSystem,
}: {
  user: SessionUser;
  repair: Awaited<ReturnType<typeof getRepair>>;
  unitSystem: UnitSystem;
}) {
  const { segments } = await repairFormOptions(user, repair.jobId);
  if (!segments.some((s) => s.id === repair.segmentId)) segments.push(repair.segment);
  // Shown to the precision the office typed: thousandths of a foot or inch, whole millimetres.
  const shown = (mm: number, kind: 'short' | 'long') =>
    Number(lengthFromSi(mm, unitSystem, kind).toFixed(unitSystem === 'imperial' ? 3 : kind === 'long' ? 3 : 0));
  return (
    <EditSection label="Edit repair">
      <RepairForm
        jobId={repair.jobId}
        repairId={repair.id}
        segments={segments}
        unitSystem={unitSystem}
        initial={{
          segmentId: repair.segmentId,
          distance: shown(repair.distanceMm, 'long'),
          defectType: repair.defectType,
          conditionGrade: repair.conditionGrade,
          defectLength: shown(repair.defectLengthMm, 'short'),
          clockPosition: repair.clockPosition ?? '',
          notes: repair.notes ?? '',
          ownerDefectCode: repair.ownerDefectCode ?? '',
        }}
      />
    </EditSection>
  );
}
