import type { Metadata } from 'next';
import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { ArchiveButton } from '@/components/desk/archive-button';
import { AuditHistory } from '@/components/desk/audit-history';
import { buttonVariants } from '@/components/ui/button';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { getCustomer } from '@/lib/data/customers';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordForPage } from '@/lib/server/page-record';
import { PageHeader } from '@/components/ui/page-header';
import { EditSection } from '@/components/desk/edit-section';
import { IntlScope } from '@/components/shell/intl-scope';
import { CustomerForm } from '../customer-form';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

export const metadata: Metadata = { title: 'Customer' };

export default async function Page({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser(DESK_ROLES);
  const customer = await recordForPage((await params).id, (id) => getCustomer(user, id));
  const tcu = await getTranslations('customers');
  const { timeZone } = await getCompany(user);
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/customers', label: 'Customers' }}
        title={customer.name}
        description={
          <>
            {label(customer.kind)} ·{' '}
            <span data-testid="customer-language">{tcu(`languages.${customer.language}`)}</span>
            {customer.archivedAt ? ' · archived' : ''}
          </>
        }
        actions={
          !customer.archivedAt && (
            <ArchiveButton url={`/api/customers/${customer.id}`} what="customer" backTo="/customers" />
          )
        }
      />
      <dl className={cn(cardClass, 'grid grid-cols-2 gap-4 text-sm md:grid-cols-4')}>
        <div>
          <dt className="text-slate-500">Contact</dt>
          <dd className="font-medium">{customer.contactName ?? '—'}</dd>
        </div>
        <div>
          <dt className="text-slate-500">E-mail</dt>
          <dd className="font-medium">{customer.email ?? '—'}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Phone</dt>
          <dd className="font-medium">{customer.phone ?? '—'}</dd>
        </div>
        <div>
          <dt className="text-slate-500">Billing address</dt>
          <dd className="whitespace-pre-line font-medium">{customer.billingAddress ?? '—'}</dd>
        </div>
        {customer.notes && (
          <div className="col-span-full">
            <dt className="text-slate-500">Notes</dt>
            <dd className="whitespace-pre-line">{customer.notes}</dd>
          </div>
        )}
      </dl>
      <EditSection label="Edit customer">
        <IntlScope namespaces={['customers']}>
          <CustomerForm customer={customer} />
        </IntlScope>
      </EditSection>
      <section>
        <div className="mb-2 flex items-center justify-between">
          <h2 className="text-lg font-semibold">Sites</h2>
          <Link href={`/sites/new?customerId=${customer.id}`} className={buttonVariants({ variant: 'secondary' })}>
            New site
          </Link>
        </div>
        <ul className="divide-y divide-slate-100 rounded-lg bg-white text-sm ring-1 ring-slate-200">
          {customer.sites.map((site) => (
            <li key={site.id} className="px-3 py-2">
              <Link href={`/sites/${site.id}`} className="font-medium text-brand-700 hover:underline">
                {site.name}
              </Link>
              <span className="text-slate-600">
                {' '}
                · {site.addressLine}, {site.city}
              </span>
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
