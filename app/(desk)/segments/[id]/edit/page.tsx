import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getSegment } from '@/lib/data/segments';
import { listAccessPoints } from '@/lib/data/access-points';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { SegmentForm } from '../../segment-form';

export const metadata: Metadata = { title: 'Edit segment' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const { id } = await params;
  const segment = await recordForPage(id, (segmentId) => getSegment(user, segmentId));
  const [accessPoints, { unitSystem }] = await Promise.all([listAccessPoints(user, segment.siteId), getCompany(user)]);
  return (
    <div className="space-y-4">
      <Link href={`/segments/${id}`} className="text-sm text-brand-700 hover:underline">← {segment.label}</Link>
      <h1 className="text-2xl font-bold">Edit segment</h1>
      <p className="text-sm text-slate-600">Site: {segment.site.name}</p>
      <SegmentForm siteId={segment.siteId} accessPoints={accessPoints} unitSystem={unitSystem} segment={segment} />
    </div>
  );
}
