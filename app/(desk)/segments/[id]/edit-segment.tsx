import { EditSection } from '@/components/desk/edit-section';
import type { SessionUser } from '@/lib/auth/session';
import { listAccessPoints } from '@/lib/data/access-points';
import type { getSegment } from '@/lib/data/segments';
import type { UnitSystem } from '@/lib/units';
import { SegmentForm } from '../segment-form';

/** The segment's form on its page: its ends are chosen among its site's access points. */
export async function EditSegment({
  user,
  segment,
  unitSystem,
}: {
  user: SessionUser;
  segment: Awaited<ReturnType<typeof getSegment>>;
  unitSystem: UnitSystem;
}) {
  const accessPoints = await listAccessPoints(user, segment.siteId);
  return (
    <EditSection label="Edit segment">
      <SegmentForm siteId={segment.siteId} accessPoints={accessPoints} unitSystem={unitSystem} segment={segment} />
    </EditSection>
  );
}
