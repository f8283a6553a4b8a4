import { Logo } from '@/components/shell/logo';
import { DeskNav, type NavItem } from '@/components/shell/desk-nav';
import { SignOutButton } from '@/components/shell/sign-out-button';
import { requirePageUser } from '@/lib/auth/session';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { REVIEW_COUNT_URL } from '@/lib/review/queue';

export const dynamic = 'force-dynamic';

const OFFICE_ITEMS: NavItem[] = [
  { href: '/jobs', label: 'Jobs' },
  { href: '/repairs', label: 'Repairs' },
  { href: '/customers', label: 'Customers' },
  { href: '/sites', label: 'Sites' },
  { href: '/schedule', label: 'Schedule' },
  { href: '/reviews', label: 'Review', countUrl: REVIEW_COUNT_URL },
  { href: '/invoices', label: 'Invoices' },
];
const ADMIN_ITEMS: NavItem[] = [{ href: '/admin', label: 'Company' }];

/** Desk mode: dense screens for the office. The layout's check is for navigation only; every page and handler checks again. */
export default async function DeskLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser(DESK_ROLES);
  const items = user.role === 'admin' ? [...OFFICE_ITEMS, ...ADMIN_ITEMS] : OFFICE_ITEMS;
  return (
    <div className="flex min-h-screen">
      <aside className="flex w-56 shrink-0 flex-col bg-slate-900 p-4 text-white">
        <div className="mb-6 flex items-center gap-2 text-brand-100">
          <Logo />
          <span className="text-lg font-bold text-white">Setline</span>
        </div>
        <DeskNav items={items} />
        <div className="mt-auto border-t border-slate-700 pt-4 text-sm">
          <p className="font-medium" data-testid="user-name">{user.name}</p>
          <p className="text-slate-400">{label(user.role)}</p>
          <SignOutButton className="mt-2 text-slate-200 underline hover:text-white" />
        </div>
      </aside>
      <div className="min-w-0 flex-1 p-6">{children}</div>
    </div>
  );
}
