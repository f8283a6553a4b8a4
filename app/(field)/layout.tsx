import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { IntlScope } from '@/components/shell/intl-scope';
import { Logo } from '@/components/shell/logo';
import { SignOutButton } from '@/components/shell/sign-out-button';
import { requirePageUser } from '@/lib/auth/session';
import { siteConfig } from '@/config/site';
import { FIELD_ROLES } from '@/lib/domain/vocabulary';

export const dynamic = 'force-dynamic';

/** Field mode: large type and targets, high contrast, one primary action per screen. */
export default async function FieldLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser(FIELD_ROLES);
  const t = await getTranslations();
  return (
    <div className="min-h-screen bg-slate-100 text-lg">
      <header className="flex items-center justify-between bg-slate-900 px-4 py-3 text-white">
        <div className="flex items-center gap-2 text-brand-100">
          <Logo className="h-8 w-8" />
          <span className="text-xl font-bold text-white">{siteConfig.name}</span>
        </div>
        <div className="flex items-center gap-4">
          {user.role === 'foreman' && (
            <Link
              href="/live"
              className="min-h-touch content-center rounded-md px-3 font-semibold underline hover:bg-slate-800"
            >
              {t('nav.live')}
            </Link>
          )}
          <span data-testid="user-name">
            {user.name} · {t(`labels.${user.role}`)}
          </span>
          <Link href="/profile" className="underline">
            {t('nav.profile')}
          </Link>
          <IntlScope namespaces={[]}>
            <SignOutButton className="min-h-touch rounded-md px-4 font-semibold ring-1 ring-slate-500 hover:bg-slate-800" />
          </IntlScope>
        </div>
      </header>
      {/* The section's error page speaks the reader's language; a page's own scope replaces this one. */}
      <main className="mx-auto max-w-3xl p-4">
        <IntlScope namespaces={[]}>{children}</IntlScope>
      </main>
    </div>
  );
}
