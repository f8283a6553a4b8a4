import Link from 'next/link';
import { IntlScope } from '@/components/shell/intl-scope';
import { Logo } from '@/components/shell/logo';
import { SignOutButton } from '@/components/shell/sign-out-button';
import { requirePageUser } from '@/lib/auth/session';
import { isDeskRole } from '@/lib/auth/roles';
import { LIVE_BOARD_ROLES } from '@/lib/data/live-board';
import { label } from '@/lib/domain/vocabulary';

export const dynamic = 'force-dynamic';

/**
 * The live board's own shell: the whole width for the clocks (it is often left open on a wall screen), with
 * the way back to the desk or, for a foreman, to Today. The check here is for navigation; the page checks again.
 */
export default async function LiveLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser(LIVE_BOARD_ROLES);
  const back = isDeskRole(user.role)
    ? { href: '/jobs', text: 'Back to the desk' }
    : { href: '/today', text: 'Back to Today' };
  // The sign-out button and the board's countdowns speak the reader's language.
  return (
    <IntlScope namespaces={[]}>
      <div className="min-h-screen bg-slate-100">
        <header className="flex flex-wrap items-center justify-between gap-3 bg-slate-900 px-4 py-3 text-white">
          <div className="flex items-center gap-4">
            <div className="flex items-center gap-2 text-brand-100">
              <Logo />
              <span className="text-lg font-bold text-white">Setline</span>
            </div>
            <Link
              href={back.href}
              className="rounded-md px-3 py-2 text-sm font-medium text-slate-200 underline hover:bg-slate-800"
            >
              {back.text}
            </Link>
          </div>
          <div className="flex items-center gap-4 text-sm">
            <span data-testid="user-name">
              {user.name} · {label(user.role)}
            </span>
            <SignOutButton className="text-slate-200 underline hover:text-white" />
          </div>
        </header>
        <main className="p-4 sm:p-6">{children}</main>
      </div>
    </IntlScope>
  );
}
