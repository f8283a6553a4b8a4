import type { Metadata } from 'next';
import Link from 'next/link';
import { AuditHistory } from '@/components/desk/audit-history';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { companyToForm, knownTimeZones } from '@/lib/validation/company';
import { CompanyForm } from './company-form';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';

export const metadata: Metadata = { title: 'Company settings' };

export default async function Page() {
  const user = await requirePageUser(ADMIN_ONLY);
  const company = await getCompany(user);
  return (
    <div className="space-y-6">
      <div>
        <Link href="/admin" className="text-sm text-brand-700 hover:underline">← Company settings</Link>
        <h1 className="mt-1 text-2xl font-bold">Company</h1>
        <p className="text-sm text-slate-600">Name, time zone, units and the planning margins every job uses.</p>
      </div>
      <CompanyForm initial={companyToForm(company)} timeZones={knownTimeZones()} />
      <AuditHistory user={user} entityType="company" entityId={company.id} timeZone={company.timeZone} />
    </div>
  );
}
