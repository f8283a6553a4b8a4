import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { IntlScope } from '@/components/shell/intl-scope';
import { Logo } from '@/components/shell/logo';
import { DeskNav } from '@/components/shell/desk-nav';
import { SignOutButton } from '@/components/shell/sign-out-button';
import { requirePageUser } from '@/lib/auth/session';
import { deskNav, navFor } from '@/config/nav';
import { siteConfig } from '@/config/site';
import { DESK_ROLES } from '@/lib/domain/vocabulary';

export const dynamic = 'force-dynamic';

/** Desk mode: dense screens for the office. The layout's check is for navigation only; every page and handler checks again. */
export default async function DeskLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser(DESK_ROLES);
  const t = await getTranslations();
  return (
    <div className="flex min-h-screen">
      <aside className="flex w-56 shrink-0 flex-col bg-slate-900 p-4 text-white">
        <div className="mb-6 flex items-center gap-2 text-brand-100">
          <Logo />
          <span className="text-lg font-bold text-white">{siteConfig.name}</span>
        </div>
        <IntlScope namespaces={['nav']}>
          <DeskNav items={navFor(deskNav, user.role)} />
          <div className="mt-auto border-t border-slate-700 pt-4 text-sm">
            <p className="font-medium" data-testid="user-name">
              {user.name}
            </p>
            <p className="text-slate-400">{t(`labels.${user.role}`)}</p>
            <Link href="/profile" className="mt-2 block text-slate-200 underline hover:text-white">
              {t('nav.profile')}
            </Link>
            <SignOutButton className="mt-2 text-slate-200 underline hover:text-white" />
          </div>
        </IntlScope>
      </aside>
      <main className="min-w-0 flex-1 p-6">
        {/* The common actions of every desk page (lists, record forms) read `common`. */}
        <IntlScope namespaces={[]}>{children}</IntlScope>
      </main>
    </div>
  );
}
