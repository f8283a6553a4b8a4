import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getSite } from '@/lib/data/sites';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { SegmentForm } from '../segment-form';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'New segment' };

export default async function Page({ searchParams }: { searchParams: Promise<{ siteId?: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const { siteId } = await searchParams;
  // A segment is always made from its site's page: without one, go and pick a site.
  if (!siteId) redirect('/sites');
  const site = await recordForPage(siteId, (id) => getSite(user, id));
  if (site.archivedAt) notFound();
  const { unitSystem } = await getCompany(user);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: `/sites/${site.id}`, label: site.name }} title="New segment" />
      {site.accessPoints.length === 0 ? (
        <p className="rounded-md bg-near-100 p-3 text-sm text-near-700">
          This site has no access points yet.{' '}
          <Link href={`/sites/${site.id}`} className="font-semibold underline">
            Add the manholes or cleanouts
          </Link>{' '}
          at each end first.
        </p>
      ) : (
        <SegmentForm siteId={site.id} accessPoints={site.accessPoints} unitSystem={unitSystem} />
      )}
    </div>
  );
}
