import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/session';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { IntlScope } from '@/components/shell/intl-scope';
import { CustomerForm } from '../customer-form';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'New customer' };

export default async function Page() {
  await requirePageUser(DESK_ROLES);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/customers', label: 'Customers' }} title="New customer" />
      <IntlScope namespaces={['customers']}>
        <CustomerForm />
      </IntlScope>
    </div>
  );
}
