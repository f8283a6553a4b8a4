'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { signOutTo } from '@/lib/client/sign-out';

export function SignOutButton({ className = '' }: { className?: string }) {
  const t = useTranslations('common');
  const [pending, setPending] = useState(false);
  return (
    <button
      type="button"
      className={className}
      disabled={pending}
      onClick={async () => {
        // Queued taps are sent only under the user who made them: once signed out, they wait on
        // this tablet until that user signs in here again.
        // The outbox (IndexedDB) loads only when asked: it is not needed to draw the page.
        const unsynced = await import('@/lib/client/outbox').then(({ pendingCount }) => pendingCount()).catch(() => 0);
        if (unsynced > 0 && !window.confirm(t('signOutConfirm', { count: unsynced }))) return;
        setPending(true);
        void signOutTo('/sign-in').catch(() => setPending(false));
      }}
    >
      {pending ? t('signingOut') : t('signOut')}
    </button>
  );
}
