import type { Metadata } from 'next';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { companyToForm, knownTimeZones } from '@/lib/validation/company';
import { CompanyForm } from './company-form';
import { PageHeader } from '@/components/ui/page-header';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'Company settings' };

export default async function Page() {
  const user = await requirePageUser(ADMIN_ONLY);
  const company = await getCompany(user);
  return (
    <div className="space-y-6">
      <PageHeader
        back={{ href: '/admin', label: 'Company settings' }}
        title="Company"
        description="Name, time zone, units and the planning margins every job uses."
      />
      <CompanyForm initial={companyToForm(company)} timeZones={knownTimeZones()} />
      <AuditHistory user={user} entityType="company" entityId={company.id} timeZone={company.timeZone} />
    </div>
  );
}
