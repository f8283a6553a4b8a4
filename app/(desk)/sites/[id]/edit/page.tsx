import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { getSite } from '@/lib/data/sites';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { SiteForm } from '../../site-form';

export const metadata: Metadata = { title: 'Edit site' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const { id } = await params;
  const site = await recordForPage(id, (siteId) => getSite(user, siteId));
  return (
    <div className="space-y-4">
      <Link href={`/sites/${id}`} className="text-sm text-brand-700 hover:underline">← {site.name}</Link>
      <h1 className="text-2xl font-bold">Edit site</h1>
      <p className="text-sm text-slate-600">Customer: {site.customer.name}</p>
      <SiteForm site={site} />
    </div>
  );
}
