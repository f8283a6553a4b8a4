import type { Metadata } from 'next';
import { cn } from '@/lib/ui/cn';
import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany, getSettingsCounts } from '@/lib/data/company';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { formatLength } from '@/lib/units';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Company settings' };

/** The admin's settings index: one card per thing the company sets up, with how many there are. */
export default async function Page() {
  const user = await requirePageUser(ADMIN_ONLY);
  const [company, counts] = await Promise.all([getCompany(user), getSettingsCounts(user)]);
  const sections = [
    {
      href: '/admin/company',
      title: 'Company',
      text:
        `Time zone ${company.timeZone} · ${company.unitSystem} units · overlap ${formatLength(company.minOverlapPerEndMm, company.unitSystem)} per ` +
        `end · working-window reserve ${Math.round(company.workingWindowSafetyMargin * 100)} % · hold reserve ${Math.round(company.holdReserve * 100)} %`,
    },
    {
      href: '/admin/users',
      title: 'Users',
      text: `${counts.activeUsers} active of ${counts.users} · roles, passwords, access`,
    },
    { href: '/admin/crews', title: 'Crews', text: `${counts.crews} crews · members and jobs per day` },
    {
      href: '/admin/resin-systems',
      title: 'Resin systems',
      text: `${counts.resinSystems} · pot life, hold and cure times, temperature range`,
    },
    { href: '/admin/resin-kits', title: 'Resin kits', text: `${counts.resinKits} lots · expiry and quantity` },
    {
      href: '/admin/packers',
      title: 'Packers',
      text: `${counts.packers} · diameter range, bladder length, pressure rating`,
    },
    {
      href: '/admin/checklists',
      title: 'Check-list templates',
      text: `${counts.checklists} · what the crew confirms before an install`,
    },
  ];
  return (
    <div className="space-y-6">
      <PageHeader title={company.name} description="Company settings" />
      <nav aria-label="Settings">
        <ul className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
          {sections.map((section) => (
            <li key={section.href}>
              <Link
                href={section.href}
                className={cn(
                  'block h-full rounded-lg bg-white p-4 ring-1 ring-slate-200 hover:ring-brand-700',
                  'focus-visible:outline focus-visible:outline-2 focus-visible:outline-brand-700',
                )}
              >
                <span className="block text-lg font-semibold text-brand-700">{section.title}</span>
                <span className="mt-1 block text-sm text-slate-600">{section.text}</span>
              </Link>
            </li>
          ))}
        </ul>
      </nav>
    </div>
  );
}
