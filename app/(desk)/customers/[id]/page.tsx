import type { Metadata } from 'next';
import Link from 'next/link';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { buttonClass } from '@/components/ui/button';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getCustomer } from '@/lib/data/customers';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';

export const metadata: Metadata = { title: 'Customer' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const customer = await recordForPage((await params).id, (id) => getCustomer(user, id));
  const { timeZone } = await getCompany(user);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <Link href="/customers" className="text-sm text-brand-700 hover:underline">← Customers</Link>
          <h1 className="mt-1 text-2xl font-bold">{customer.name}</h1>
          <p className="text-slate-600">{label(customer.kind)}{customer.archivedAt ? ' · archived' : ''}</p>
        </div>
        <div className="flex gap-2">
          <Link href={`/customers/${customer.id}/edit`} className={buttonClass('secondary')}>Edit</Link>
          {!customer.archivedAt && <ArchiveButton url={`/api/customers/${customer.id}`} what="customer" backTo="/customers" />}
        </div>
      </div>
      <dl className="grid grid-cols-2 gap-4 rounded-lg bg-white p-4 text-sm ring-1 ring-slate-200 md:grid-cols-4">
        <div><dt className="text-slate-500">Contact</dt><dd className="font-medium">{customer.contactName ?? '—'}</dd></div>
        <div><dt className="text-slate-500">E-mail</dt><dd className="font-medium">{customer.email ?? '—'}</dd></div>
        <div><dt className="text-slate-500">Phone</dt><dd className="font-medium">{customer.phone ?? '—'}</dd></div>
        <div><dt className="text-slate-500">Billing address</dt><dd className="whitespace-pre-line font-medium">{customer.billingAddress ?? '—'}</dd></div>
        {customer.notes && <div className="col-span-full"><dt className="text-slate-500">Notes</dt><dd className="whitespace-pre-line">{customer.notes}</dd></div>}
      </dl>
      <section>
        <div className="mb-2 flex items-center justify-between">
          <h2 className="text-lg font-semibold">Sites</h2>
          <Link href={`/sites/new?customerId=${customer.id}`} className={buttonClass('secondary')}>New site</Link>
        </div>
        <ul className="divide-y divide-slate-100 rounded-lg bg-white text-sm ring-1 ring-slate-200">
          {customer.sites.map((site) => (
            <li key={site.id} className="px-3 py-2">
              <Link href={`/sites/${site.id}`} className="font-medium text-brand-700 hover:underline">{site.name}</Link>
              <span className="text-slate-600"> · {site.addressLine}, {site.city}</span>
              {site.archivedAt && <span className="text-xs text-slate-500"> (archived)</span>}
            </li>
          ))}
          {customer.sites.length === 0 && <li className="px-3 py-4 text-slate-500">No sites yet.</li>}
        </ul>
      </section>
      <AuditHistory user={user} entityType="customer" entityId={customer.id} timeZone={timeZone} />
    </div>
  );
}
